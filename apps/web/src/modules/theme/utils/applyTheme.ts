// Puts the theme on the document root and remembers it.
import { Classes } from '@blueprintjs/core';
import { THEME_STORAGE_KEY, type Theme } from './readInitialTheme.js';

/** Sets or removes Blueprint's dark class on <html> and stores the choice in localStorage. */
export function applyTheme(theme: Theme): void {
  const root = document.documentElement;
  root.classList.toggle(Classes.DARK, theme === 'dark');
  root.style.colorScheme = theme;
  try {
    window.localStorage.setItem(THEME_STORAGE_KEY, theme);
  } catch {
    // Not remembered when storage is blocked; the class still applies for this visit.
  }
}
