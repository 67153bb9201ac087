// The theme to start with: the one remembered, else the system's preference.

/** The two themes of the app. */
export type Theme = 'light' | 'dark';

/** localStorage key under which the chosen theme is remembered. */
export const THEME_STORAGE_KEY = 'hexloom.theme';

/** Reads the remembered theme, falling back to prefers-color-scheme, then to light. */
export function readInitialTheme(): Theme {
  try {
    const stored = window.localStorage.getItem(THEME_STORAGE_KEY);
    if (stored === 'light' || stored === 'dark') return stored;
  } catch {
    // Storage can be blocked (private mode); the system preference still applies.
  }
  const prefersDark = typeof window.matchMedia === 'function' && window.matchMedia('(prefers-color-scheme: dark)').matches;
  return prefersDark ? 'dark' : 'light';
}
