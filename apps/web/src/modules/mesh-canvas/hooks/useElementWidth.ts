// The rendered width of an element, kept up to date as it resizes.
import { useLayoutEffect, useState, type RefObject } from 'react';

/** Width of `ref`'s element in CSS pixels (`fallback` until it is measured, or where nothing is laid out). */
export function useElementWidth(ref: RefObject<HTMLElement | null>, fallback = 800): number {
  const [width, setWidth] = useState(fallback);
  useLayoutEffect(() => {
    const element = ref.current;
    if (!element) return;
    const measure = () => setWidth(element.clientWidth > 0 ? element.clientWidth : fallback);
    measure();
    const observer = new ResizeObserver(measure);
    observer.observe(element);
    return () => observer.disconnect();
  }, [ref, fallback]);
  return width;
}
