// The theme toggle: switches Blueprint's dark class on the root and remembers the choice.
import { fireEvent, render, screen } from '@testing-library/react';
import { afterEach, describe, expect, it, vi } from 'vitest';
import { THEME_STORAGE_KEY } from '../utils/readInitialTheme.js';
import { ThemeProvider } from './ThemeProvider.js';
import { ThemeToggle } from './ThemeToggle.js';

const renderToggle = () =>
  render(
    <ThemeProvider>
      <ThemeToggle />
    </ThemeProvider>,
  );

afterEach(() => vi.restoreAllMocks());

describe('ThemeToggle', () => {
  it('switches the bp6-dark class on <html> on and off and stores the theme', () => {
    renderToggle();
    const root = document.documentElement;
    expect(root.classList.contains('bp6-dark')).toBe(false);
    fireEvent.click(screen.getByTestId('theme-toggle'));
    expect(root.classList.contains('bp6-dark')).toBe(true);
    expect(window.localStorage.getItem(THEME_STORAGE_KEY)).toBe('dark');
    fireEvent.click(screen.getByTestId('theme-toggle'));
    expect(root.classList.contains('bp6-dark')).toBe(false);
    expect(window.localStorage.getItem(THEME_STORAGE_KEY)).toBe('light');
  });

  it('starts dark when the system prefers a dark colour scheme and nothing is stored', () => {
    vi.spyOn(window, 'matchMedia').mockImplementation((query: string) => ({ matches: query.includes('dark'), media: query }) as MediaQueryList);
    renderToggle();
    expect(document.documentElement.classList.contains('bp6-dark')).toBe(true);
  });

  it('prefers the remembered theme over the system preference', () => {
    vi.spyOn(window, 'matchMedia').mockImplementation((query: string) => ({ matches: query.includes('dark'), media: query }) as MediaQueryList);
    window.localStorage.setItem(THEME_STORAGE_KEY, 'light');
    renderToggle();
    expect(document.documentElement.classList.contains('bp6-dark')).toBe(false);
  });
});
