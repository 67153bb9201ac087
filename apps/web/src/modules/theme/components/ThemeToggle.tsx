// Navbar button that switches between the light and dark themes.
import { Button } from '@blueprintjs/core';
import { useTheme } from '../hooks/useTheme.js';

/** A minimal icon button; its label names the theme it switches to. */
export function ThemeToggle() {
  const { theme, setTheme } = useTheme();
  const next = theme === 'dark' ? 'light' : 'dark';
  const label = `Switch to ${next} theme`;
  return (
    <Button
      variant="minimal"
      icon={theme === 'dark' ? 'flash' : 'moon'}
      aria-label={label}
      title={label}
      data-testid="theme-toggle"
      onClick={() => setTheme(next)}
    />
  );
}
