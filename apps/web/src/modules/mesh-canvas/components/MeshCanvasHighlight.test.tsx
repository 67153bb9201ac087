// MeshCanvas highlightGateIds: the named gates get an outline, a description and a legend entry; none without it.
/// <reference types="node" />
import { readFileSync } from 'node:fs';
import { dirname, join } from 'node:path';
import { fileURLToPath } from 'node:url';
import type { MeshDefinitionFile } from '@hexloom/contracts';
import { DEMO_TECHNOLOGY, makeMeshDefinition } from '@hexloom/mesh';
import { render, screen } from '@testing-library/react';
import { describe, expect, it } from 'vitest';
import { contrastRatio } from '../utils/contrastRatio.js';
import { MeshCanvas } from './MeshCanvas.js';

const definition = makeMeshDefinition({ name: 'highlight fixture', shape: { kind: 'rectangle', rows: 2, columns: 3 }, technology: DEMO_TECHNOLOGY, io: 'left-right' }) as MeshDefinitionFile;
const marked = () => Array.from(document.querySelectorAll('[data-marked="true"]')).map((g) => g.getAttribute('data-gate-id'));
const css = readFileSync(join(dirname(fileURLToPath(import.meta.url)), '..', 'meshCanvas.css'), 'utf8');
const block = (selector: string) => css.slice(css.indexOf(`${selector} {`), css.indexOf('}', css.indexOf(`${selector} {`)));
const variable = (text: string, name: string) => new RegExp(`--${name}:\\s*(#[0-9a-f]{6})`, 'i').exec(text)?.[1] ?? 'missing';

describe('MeshCanvas highlightGateIds', () => {
  it('outlines exactly the named gates, describes them with the label and counts them in the legend', () => {
    render(<MeshCanvas definition={definition} highlightGateIds={['g(0,0)e', 'g(1,0)ne']} highlightLabel="Changed since v2" />);
    expect(marked().sort()).toEqual(['g(0,0)e', 'g(1,0)ne']);
    const gate = document.querySelector('[data-gate-id="g(0,0)e"]')!;
    expect(gate.querySelector('.hx-mesh-gate-mark-outline')).not.toBeNull();
    expect(gate.querySelector('desc')?.textContent).toMatch(/^Changed since v2\. /);
    expect(document.querySelector('[data-gate-id="g(0,1)e"] .hx-mesh-gate-mark-outline')).toBeNull();
    expect(screen.getByTestId('mesh-legend').querySelector('[data-state="marked"]')?.textContent).toBe('Changed since v2 (2)');
  });

  it('marks nothing and adds no legend entry when no gate is named', () => {
    render(<MeshCanvas definition={definition} />);
    expect(marked()).toEqual([]);
    expect(screen.getByTestId('mesh-legend').querySelector('[data-state="marked"]')).toBeNull();
  });

  it('draws the outline with at least 3:1 contrast on the canvas of each theme (WCAG 2.1, SC 1.4.11)', () => {
    for (const selector of [':root', '.bp6-dark']) {
      expect(contrastRatio(variable(block(selector), 'hx-mesh-marked'), variable(block(selector), 'hx-mesh-bg')), selector).toBeGreaterThanOrEqual(3);
    }
  });
});
