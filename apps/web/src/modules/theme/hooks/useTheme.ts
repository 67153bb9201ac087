// Reads the current theme from ThemeProvider.
import { useContext } from 'react';
import { ThemeContext, type ThemeContextValue } from '../utils/ThemeContext.js';

/** The current theme and its setter; throws when used outside ThemeProvider. */
export function useTheme(): ThemeContextValue {
  const value = useContext(ThemeContext);
  if (!value) throw new Error('useTheme must be used inside <ThemeProvider>');
  return value;
}
