// ResponsePlots: overlaid traces with a legend, views, mask fail shading, cursor read-out, zoom reset and downloads.
import { fireEvent, render, screen, within } from '@testing-library/react';
import userEvent from '@testing-library/user-event';
import axe from 'axe-core';
import type { Mask } from '@hexloom/contracts';
import { afterEach, describe, expect, it, vi } from 'vitest';
import { ringNotchContent } from '../testing/ringNotchContent.js';
import { computeSpectra } from '../utils/computeSpectra.js';
import { setCouplerKappa } from '../utils/setCouplerKappa.js';
import { ResponsePlots } from './ResponsePlots.js';

// The example ring moved to critical coupling (through power kappa = a^2 = 0.708 here) for a deep, clear notch.
const content = setCouplerKappa(ringNotchContent(), 'notch', ringNotchContent().circuits[0]?.couplers[0]?.gate as string, 0.708);
const grid = { kind: 'span', startOffsetHz: -10e9, stopOffsetHz: 10e9, points: 401 } as const;
const spectra = computeSpectra({ content, pairs: [{ from: 'in', to: 'out' }, { from: 'in', to: 'in' }], grid });
const ref = content.mesh.technology.referenceFrequencyHz;
const notchHz = (() => {
  const db = spectra[0]!.points.amplitudeDb.map((v) => v ?? -400);
  return spectra[0]!.points.offsetHz[db.indexOf(Math.min(...db))] as number;
})();

afterEach(() => vi.restoreAllMocks());

describe('ResponsePlots', () => {
  it('overlays one trace per port pair and names each in the legend', () => {
    render(<ResponsePlots spectra={spectra} referenceFrequencyHz={ref} title="Circuit notch" />);
    expect(screen.getByTestId('trace-0').getAttribute('d')).toMatch(/^M/);
    expect(screen.getByTestId('trace-1').getAttribute('d')).toMatch(/^M/);
    expect(within(screen.getByTestId('plot-legend')).getByText('in → out')).toBeTruthy();
    expect(within(screen.getByTestId('plot-legend')).getByText('in → in')).toBeTruthy();
  });

  it("shades the bands review comments point at, with the comment's words on hover", () => {
    render(<ResponsePlots spectra={spectra} referenceFrequencyHz={ref} bands={[{ fromHz: 1e9, toHz: 2e9, label: 'ripple here?' }]} />);
    const band = screen.getByTestId('comment-band');
    expect(Number(band.getAttribute('width'))).toBeGreaterThan(2);
    expect(band.textContent).toBe('Comment: ripple here?');
  });

  it('switches views and labels the axis in words and units', async () => {
    const user = userEvent.setup();
    render(<ResponsePlots spectra={spectra} referenceFrequencyHz={ref} />);
    for (const [tab, label] of [['Phase', 'Phase, unwrapped (rad)'], ['Group delay', 'Group delay (ps)'], ['Dispersion', 'Dispersion (ps/GHz)'], ['RF response', 'RF gain (dB)']] as const) {
      await user.click(screen.getByRole('tab', { name: tab }));
      expect(screen.getByText(label)).toBeTruthy();
      expect(screen.getByTestId('trace-0').getAttribute('d')).toMatch(/^M/);
    }
    expect(screen.getByTestId('rf-note').textContent).toMatch(/photodetector/);
    expect(screen.getByLabelText('RF modulation and detection')).toBeTruthy();
  });

  it('shades in the fail colour where the notch breaks a pass band laid over it, and not a stop band it meets', () => {
    // The notch is more than 10 dB deep: a stop band on its centre passes, a 5 dB insertion-loss pass band over it fails.
    const mask: Mask = { regions: [{ kind: 'stop', range: { fromHz: notchHz - 0.02e9, toHz: notchHz + 0.02e9 }, minRejectionDb: 10 }, { kind: 'pass', range: { fromHz: notchHz - 1e9, toHz: notchHz + 1e9 }, maxInsertionLossDb: 5 }] };
    render(<ResponsePlots spectra={spectra} mask={mask} referenceFrequencyHz={ref} />);
    expect(screen.getByTestId('mask-region-0').getAttribute('data-verdict')).toBe('pass');
    expect(screen.getByTestId('mask-region-1').getAttribute('data-verdict')).toBe('fail');
    expect(within(screen.getByTestId('mask-region-1')).getAllByTestId('mask-fail').length).toBeGreaterThan(0);
    expect(screen.getByTestId('mask-verdict').textContent).toMatch(/breaks the mask in 1 of 2 regions/);
  });

  it('reads the value of each trace at the pointer in units', () => {
    render(<ResponsePlots spectra={spectra} referenceFrequencyHz={ref} />);
    // jsdom lays nothing out: the SVG's box is 0 wide, so a client x is taken in user units (plot area 64..744).
    fireEvent.pointerMove(screen.getByTestId('response-chart'), { clientX: 404 });
    const text = screen.getByTestId('cursor-readout').textContent ?? '';
    expect(text).toMatch(/in → out: −?\d+\.\d\d dB at [+−]0\.\d{3} GHz from the carrier/);
    expect(text).toMatch(/in → in: /);
    expect(screen.getByTestId('cursor-line')).toBeTruthy();
  });

  it('draws a wavelength axis in nm when asked', async () => {
    const user = userEvent.setup();
    render(<ResponsePlots spectra={spectra} referenceFrequencyHz={ref} />);
    await user.click(screen.getByLabelText('Wavelength axis'));
    expect(screen.getByTestId('wavelength-axis').textContent).toMatch(/1550\.\d+/);
  });

  it('downloads the plot as SVG and the data as CSV and Touchstone', async () => {
    const user = userEvent.setup();
    const blobs: Blob[] = [];
    vi.spyOn(URL, 'createObjectURL').mockImplementation((b) => (blobs.push(b as Blob), 'blob:plot'));
    vi.spyOn(URL, 'revokeObjectURL').mockImplementation(() => undefined);
    vi.spyOn(HTMLAnchorElement.prototype, 'click').mockImplementation(() => undefined);
    render(<ResponsePlots spectra={spectra} referenceFrequencyHz={ref} title="Circuit notch" />);
    for (const item of ['Plot as SVG', 'in → out as CSV', 'in → out as Touchstone (.s2p)']) {
      await user.click(screen.getByRole('button', { name: 'Download the plot or its data' }));
      await user.click(await screen.findByText(item));
    }
    const [svg, csv, s2p] = await Promise.all(blobs.map((b) => b.text()));
    expect(svg).toMatch(/^<\?xml[\s\S]*<svg[^>]*xmlns="http:\/\/www\.w3\.org\/2000\/svg"[\s\S]*data-testid="trace-0"/);
    expect(csv?.split('\n').find((l) => !l.startsWith('#'))).toBe('frequency_hz,offset_hz,amplitude_db,phase_deg,group_delay_ps,dispersion_ps_per_nm,re,im');
    expect(s2p).toMatch(/# GHZ S DB R 50/);
  });

  it('gives every control an accessible name (axe, contrast left to the browser)', async () => {
    render(<ResponsePlots spectra={spectra} referenceFrequencyHz={ref} title="Circuit notch" />);
    const results = await axe.run(screen.getByTestId('response-plots'), { rules: { 'color-contrast': { enabled: false } } });
    expect(results.violations.map((v) => `${v.id}: ${v.nodes.map((n) => n.html).join(' | ')}`)).toEqual([]);
  });
});
