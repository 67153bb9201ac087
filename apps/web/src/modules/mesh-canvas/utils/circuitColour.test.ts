// The circuit palette: distinct colours, each readable as a graphical object on the canvas of both themes.
/// <reference types="node" />
import { readFileSync } from 'node:fs';
import { dirname, join } from 'node:path';
import { fileURLToPath } from 'node:url';
import { describe, expect, it } from 'vitest';
import { CIRCUIT_PALETTE, circuitColour } from './circuitColour.js';
import { contrastRatio } from './contrastRatio.js';

// Read from disk: vitest hands CSS imports to tests as empty strings.
const css = readFileSync(join(dirname(fileURLToPath(import.meta.url)), '..', 'meshCanvas.css'), 'utf8');
const block = (selector: string) => css.slice(css.indexOf(`${selector} {`), css.indexOf('}', css.indexOf(`${selector} {`)));
const variable = (text: string, name: string) => new RegExp(`--${name}:\\s*(#[0-9a-f]{6})`, 'i').exec(text)?.[1] ?? 'missing';
const backgrounds = { light: variable(block(':root'), 'hx-mesh-bg'), dark: variable(block('.bp6-dark'), 'hx-mesh-bg') };

describe('circuitColour', () => {
  it('gives different colours to the first eight circuits and repeats after them', () => {
    const first = Array.from({ length: CIRCUIT_PALETTE.length }, (_, i) => circuitColour(i));
    expect(new Set(first).size).toBe(CIRCUIT_PALETTE.length);
    expect(circuitColour(CIRCUIT_PALETTE.length)).toBe(circuitColour(0));
    expect(circuitColour(-1)).toBe(circuitColour(CIRCUIT_PALETTE.length - 1));
  });

  it('has at least 3:1 contrast against the canvas background of the light and dark themes (WCAG 2.1, SC 1.4.11)', () => {
    expect(backgrounds).toEqual({ light: '#ffffff', dark: '#1b1f26' });
    for (const colour of CIRCUIT_PALETTE) {
      expect(contrastRatio(colour, backgrounds.light)).toBeGreaterThanOrEqual(3);
      expect(contrastRatio(colour, backgrounds.dark)).toBeGreaterThanOrEqual(3);
    }
  });

  it('draws every gate state and the ports with at least 3:1 contrast on the canvas of each theme (WCAG 2.1, SC 1.4.11)', () => {
    for (const [theme, selector] of [['light', ':root'], ['dark', '.bp6-dark']] as const) {
      for (const name of ['hx-mesh-bar', 'hx-mesh-cross', 'hx-mesh-split', 'hx-mesh-idle', 'hx-mesh-dead', 'hx-mesh-port']) {
        expect(contrastRatio(variable(block(selector), name), backgrounds[theme]), `${name} in the ${theme} theme`).toBeGreaterThanOrEqual(3);
      }
    }
  });
});

describe('contrastRatio', () => {
  it('gives 21:1 for black on white and 1:1 for a colour on itself (WCAG 2.1 definition of contrast ratio)', () => {
    expect(contrastRatio('#000000', '#ffffff')).toBeCloseTo(21, 6);
    expect(contrastRatio('#767676', '#767676')).toBeCloseTo(1, 9);
    // #767676 on white is the usual smallest grey that passes 4.5:1 (WebAIM contrast checker, from memory: 4.54).
    expect(contrastRatio('#767676', '#ffffff')).toBeCloseTo(4.54, 2);
  });
});
