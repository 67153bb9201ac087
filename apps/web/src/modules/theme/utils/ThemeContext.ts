// React context carrying the current theme and a way to change it.
import { createContext } from 'react';
import type { Theme } from './readInitialTheme.js';

export type ThemeContextValue = { theme: Theme; setTheme: (theme: Theme) => void };

/** Provided by ThemeProvider; undefined outside it. */
export const ThemeContext = createContext<ThemeContextValue | undefined>(undefined);
