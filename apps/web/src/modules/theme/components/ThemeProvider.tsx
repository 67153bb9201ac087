// Holds the light/dark theme and keeps the document root in step with it.
import { useLayoutEffect, useMemo, useState, type ReactNode } from 'react';
import { applyTheme } from '../utils/applyTheme.js';
import { readInitialTheme, type Theme } from '../utils/readInitialTheme.js';
import { ThemeContext } from '../utils/ThemeContext.js';

/** Provides the theme (remembered, else from prefers-color-scheme) to the tree. */
export function ThemeProvider({ children }: { children: ReactNode }) {
  const [theme, setTheme] = useState<Theme>(readInitialTheme);
  useLayoutEffect(() => applyTheme(theme), [theme]);
  const value = useMemo(() => ({ theme, setTheme }), [theme]);
  return <ThemeContext.Provider value={value}>{children}</ThemeContext.Provider>;
}
