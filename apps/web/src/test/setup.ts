// jsdom gaps filled for Blueprint (ResizeObserver, matchMedia, element sizes) and RTL cleanup.
import { cleanup } from '@testing-library/react';
import { afterEach } from 'vitest';

afterEach(() => {
  cleanup();
  window.localStorage.clear();
  document.documentElement.className = '';
});

class ResizeObserverStub {
  observe(): void {}
  unobserve(): void {}
  disconnect(): void {}
}
if (!('ResizeObserver' in window)) {
  Object.defineProperty(window, 'ResizeObserver', { value: ResizeObserverStub, writable: true });
}

if (typeof window.matchMedia !== 'function') {
  Object.defineProperty(window, 'matchMedia', {
    writable: true,
    value: (query: string): MediaQueryList =>
      ({
        matches: false,
        media: query,
        onchange: null,
        addListener: () => undefined,
        removeListener: () => undefined,
        addEventListener: () => undefined,
        removeEventListener: () => undefined,
        dispatchEvent: () => false,
      }) as MediaQueryList,
  });
}

// Blueprint Table only renders the cells inside its measured viewport; jsdom measures everything as 0.
const sizes: Array<[keyof HTMLElement, number]> = [
  ['clientWidth', 1200],
  ['clientHeight', 800],
  ['offsetWidth', 1200],
  ['offsetHeight', 800],
];
for (const [key, value] of sizes) {
  Object.defineProperty(HTMLElement.prototype, key, { configurable: true, get: () => value });
}
