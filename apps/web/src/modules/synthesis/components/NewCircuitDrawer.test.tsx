// The new-circuit drawer's request: every kind's defaults make a valid body in SI units, bad values are refused in words.
import { synthesiseBodySchema, type FilterSpecKind, type SynthesiseBody } from '@hexloom/contracts';
import { screen, waitFor, within } from '@testing-library/react';
import axe from 'axe-core';
import { afterEach, describe, expect, it, vi } from 'vitest';
import { mockApi, type MockCall } from '../../../test/mockApi.js';
import { refusedProposal, SYNTHESISE_ROUTE } from '../test/demoSynthesis.js';
import { renderNewCircuitDrawer } from '../test/renderNewCircuitDrawer.js';

afterEach(() => vi.unstubAllGlobals());

/** Same value within a relative 1e-12 (a GHz figure typed as text and scaled by 1e9). */
const expectClose = (actual: unknown, expected: number) => {
  expect(typeof actual).toBe('number');
  expect(Math.abs((actual as number) - expected)).toBeLessThanOrEqual(Math.abs(expected) * 1e-12);
};

const sentBody = (calls: MockCall[]): SynthesiseBody => {
  const posts = calls.filter((c) => c.key === SYNTHESISE_ROUTE);
  expect(posts).toHaveLength(1);
  return posts[0]?.body as SynthesiseBody;
};

/** The words under a field: the element its input names with aria-describedby. */
const noteUnder = (label: string) => {
  const input = screen.getByLabelText(label);
  const id = input.getAttribute('aria-describedby');
  return id ? (document.getElementById(id)?.textContent ?? '') : '';
};

/** What each kind's default request must contain once converted (1 GHz = 1e9 Hz: SI prefix, common practice). */
const EXPECTED: Record<FilterSpecKind, (spec: Record<string, unknown>, body: SynthesiseBody) => void> = {
  'delay-line': (s) => {
    expect(s.delay).toEqual({ ps: 400 });
    expect(s.bandHz).toEqual({ fromHz: -1e9, toHz: 1e9 });
  },
  'ttd-set': (s) => {
    expect(s.outputs).toEqual(['E09', 'E13', 'E21', 'E25']);
    expect(s.stepPs).toBe(37.5);
    expect(s.bandHz).toEqual({ fromHz: -1e9, toHz: 1e9 });
  },
  'ring-notch': (s, body) => {
    expectClose(s.centreOffsetHz, 3e9);
    expect(s.target).toEqual({ notchDepthDb: 20, regime: 'under' });
    const region = body.spec.mask.regions[0];
    expectClose(region?.range.fromHz, 2.98e9);
    expectClose(region?.range.toHz, 3.02e9);
  },
  'add-drop': (s) => {
    expectClose(s.centreOffsetHz, -2e9);
    expectClose(s.bandwidthHz, 1.5e9);
    expect(s.ring).toEqual({ perimeterUnits: 6 });
  },
  'coupled-ring-bandpass': (s, body) => {
    expectClose(s.bandwidthHz, 1.2e9);
    expectClose(s.centreOffsetHz, 2e9);
    expect(s.rippleDb).toBeUndefined();
    expect(body.spec.mask.regions.map((r) => r.kind)).toEqual(['pass', 'stop']);
    expectClose(body.spec.mask.regions[1]?.range.toHz, 7e9);
  },
  'mzi-lattice': (s) => {
    expectClose(s.centreOffsetHz, 8e9);
    expectClose(s.widthHz, 20e9);
    expect(s.armDifferenceUnits).toBe(2);
  },
  transversal: (s) => {
    expect(s.taps).toEqual([1, 2, 1]);
    expect(s.tapDelayUnits).toBe(2);
  },
  'allpass-equaliser': (s) => {
    expect(s.band).toEqual({ fromHz: 1e9, toHz: 4e9 });
    expect(s.target).toEqual({ slopePsPerGHz: 3 });
  },
};

// Typing through user-event is slow on a shared 2-core machine: a generous per-test timeout.
describe('NewCircuitDrawer request', { timeout: 20_000 }, () => {
  for (const kind of Object.keys(EXPECTED) as FilterSpecKind[]) {
    it(`sends a body the contract accepts for the ${kind} defaults, frequencies in Hz`, async () => {
      const calls = mockApi({ [SYNTHESISE_ROUTE]: { body: refusedProposal } });
      const { user } = renderNewCircuitDrawer();
      await user.selectOptions(screen.getByLabelText('Kind of circuit'), kind);
      await user.click(screen.getByTestId('synthesise'));
      await waitFor(() => expect(calls.some((c) => c.key === SYNTHESISE_ROUTE)).toBe(true));
      const body = sentBody(calls);
      expect(synthesiseBodySchema.safeParse(body).success).toBe(true);
      expect(body.circuitId).toBe(`${kind}-1`);
      expect(body.spec.spec.kind).toBe(kind);
      EXPECTED[kind](body.spec.spec as Record<string, unknown>, body);
    });
  }

  it('converts a typed 2 GHz offset to 2e9 Hz and a mask row typed in GHz to Hz', async () => {
    const calls = mockApi({ [SYNTHESISE_ROUTE]: { body: refusedProposal } });
    const { user } = renderNewCircuitDrawer();
    const offset = screen.getByLabelText('Notch offset from the carrier (GHz)');
    await user.clear(offset);
    await user.type(offset, '2');
    await user.click(screen.getByRole('button', { name: 'Add mask row' }));
    await user.selectOptions(screen.getByLabelText('Mask row 2 region'), 'stop');
    await user.type(screen.getByLabelText('Mask row 2 band start (GHz)'), '-0.25');
    await user.type(screen.getByLabelText('Mask row 2 band stop (GHz)'), '0.75');
    await user.type(screen.getByLabelText('Mask row 2 least rejection (dB)'), '30');
    await user.selectOptions(screen.getByLabelText('Mask row 2 output'), 'E03');
    await user.click(screen.getByTestId('synthesise'));
    await waitFor(() => expect(calls.some((c) => c.key === SYNTHESISE_ROUTE)).toBe(true));
    const body = sentBody(calls);
    expectClose(body.spec.spec.kind === 'ring-notch' ? body.spec.spec.centreOffsetHz : Number.NaN, 2e9);
    expect(body.spec.mask.regions[1]).toEqual({ kind: 'stop', port: 'E03', range: { fromHz: -0.25e9, toHz: 0.75e9 }, minRejectionDb: 30 });
  });

  it('lists only free ports, by label, never by internal id', () => {
    mockApi({});
    renderNewCircuitDrawer();
    const options = within(screen.getByLabelText('Input port')).getAllByRole('option').map((o) => o.textContent ?? '');
    expect(options).toContain('W01 · fibre');
    expect(options).toContain('E01 · detector');
    expect(options.some((o) => o.startsWith('W02') || o.startsWith('E02'))).toBe(false);
    expect(options.some((o) => o.includes('v(') || o.includes('g('))).toBe(false);
  });

  it('shows a negative bandwidth and unreadable numbers as errors in words under the field, and sends nothing', async () => {
    const calls = mockApi({ [SYNTHESISE_ROUTE]: { body: refusedProposal } });
    const { user } = renderNewCircuitDrawer();
    await user.selectOptions(screen.getByLabelText('Kind of circuit'), 'add-drop');
    const bandwidth = screen.getByLabelText('Drop bandwidth (3 dB) (GHz)');
    await user.clear(bandwidth);
    await user.type(bandwidth, '-1');
    const offset = screen.getByLabelText('Band centre offset from the carrier (GHz)');
    await user.clear(offset);
    await user.type(offset, 'abc');
    await user.click(screen.getByTestId('synthesise'));
    expect(await screen.findByText('Must be above 0 GHz')).toBeTruthy();
    expect(noteUnder('Drop bandwidth (3 dB) (GHz)')).toBe('Must be above 0 GHz');
    expect(noteUnder('Band centre offset from the carrier (GHz)')).toBe('Enter a number');
    expect(document.body.textContent).not.toMatch(/expected number|received|NaN|Too small/);
    expect(calls.filter((c) => c.key === SYNTHESISE_ROUTE)).toHaveLength(0);

    await user.clear(bandwidth);
    await user.type(bandwidth, '1.5');
    await user.clear(offset);
    await user.type(offset, '-2');
    expect(noteUnder('Drop bandwidth (3 dB) (GHz)')).toBe('');
    await user.click(screen.getByTestId('synthesise'));
    await waitFor(() => expect(calls.filter((c) => c.key === SYNTHESISE_ROUTE)).toHaveLength(1));
  });

  it('refuses an empty circuit id and one already on the version, sending nothing', async () => {
    const calls = mockApi({ [SYNTHESISE_ROUTE]: { body: refusedProposal } });
    const { user } = renderNewCircuitDrawer();
    const id = screen.getByLabelText('Circuit id');
    await user.clear(id);
    await user.click(screen.getByTestId('synthesise'));
    await waitFor(() => expect(noteUnder('Circuit id')).toBe('Enter a circuit id'));
    await user.type(id, 'delay-a');
    expect(noteUnder('Circuit id')).toBe('This version already has a circuit called delay-a; choose another id');
    await user.clear(id);
    await user.type(id, '9lives');
    expect(noteUnder('Circuit id')).toBe('Start with a letter, then use letters, digits, _ or -');
    await user.click(screen.getByTestId('synthesise'));
    expect(calls.filter((c) => c.key === SYNTHESISE_ROUTE)).toHaveLength(0);
  });

  it('refuses a mask row whose band ends below its start, and an odd tap delay, under their cells', async () => {
    const calls = mockApi({ [SYNTHESISE_ROUTE]: { body: refusedProposal } });
    const { user } = renderNewCircuitDrawer();
    await user.selectOptions(screen.getByLabelText('Kind of circuit'), 'transversal');
    const delay = screen.getByLabelText('Delay between taps (units of length)');
    await user.clear(delay);
    await user.type(delay, '3');
    await user.click(screen.getByRole('button', { name: 'Add mask row' }));
    await user.type(screen.getByLabelText('Mask row 1 band start (GHz)'), '5');
    await user.type(screen.getByLabelText('Mask row 1 band stop (GHz)'), '4');
    await user.click(screen.getByTestId('synthesise'));
    expect(await screen.findByText('The band must end above where it starts')).toBeTruthy();
    expect(noteUnder('Delay between taps (units of length)')).toBe('Must be an even number of units (the mesh is bipartite)');
    await user.click(screen.getByRole('button', { name: 'Remove mask row 1' }));
    expect(screen.queryByText('The band must end above where it starts')).toBeNull();
    expect(calls.filter((c) => c.key === SYNTHESISE_ROUTE)).toHaveLength(0);
  });

  for (const kind of Object.keys(EXPECTED)) {
    it(`gives every control of the ${kind} form an accessible name (axe; contrast is left to the browser)`, async () => {
      mockApi({});
      const { user } = renderNewCircuitDrawer();
      await user.selectOptions(screen.getByLabelText('Kind of circuit'), kind);
      const results = await axe.run(screen.getByTestId('new-circuit-form'), { rules: { 'color-contrast': { enabled: false } } });
      expect(results.passes.some((rule) => rule.id === 'label')).toBe(true);
      expect(results.violations.map((v) => `${v.id}: ${v.nodes.map((n) => n.html).join(' | ')}`)).toEqual([]);
    });
  }
});
