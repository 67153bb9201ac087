// TuningPanel: named sliders on a circuit's knobs, each step giving a new content through the pure tuning functions.
import { fireEvent, render, screen } from '@testing-library/react';
import type { ConfigurationFile } from '@hexloom/contracts';
import { describe, expect, it, vi } from 'vitest';
import { ringNotchContent } from '../testing/ringNotchContent.js';
import { centreShiftHz } from '../utils/centreShift.js';
import { TuningPanel } from './TuningPanel.js';

const content = ringNotchContent();
const coupler = content.circuits[0]?.couplers[0]?.gate as string;

describe('TuningPanel', () => {
  it('offers the centre frequency, the coupling and the phase of the coupler as named sliders', () => {
    render(<TuningPanel content={content} circuitId="notch" onChange={() => undefined} />);
    expect(screen.getByRole('slider', { name: 'Centre frequency shift of circuit notch' })).toBeTruthy();
    expect(screen.getByRole('slider', { name: `Coupling of ${coupler}` })).toBeTruthy();
    expect(screen.getByRole('slider', { name: `Phase of ${coupler}` })).toBeTruthy();
    expect(screen.getByText('kappa 0.100, 10.0 % of the power crosses')).toBeTruthy();
  });

  it('sends a new content with the new kappa on a step of the coupling slider', () => {
    const onChange = vi.fn<(c: ConfigurationFile) => void>();
    render(<TuningPanel content={content} circuitId="notch" onChange={onChange} />);
    fireEvent.keyDown(screen.getByRole('slider', { name: `Coupling of ${coupler}` }), { key: 'ArrowUp', which: 38, keyCode: 38 });
    const next = onChange.mock.calls[0]?.[0];
    expect(next?.gates.find((g) => g.gate === coupler)?.kappa).toBeCloseTo(0.101, 12);
    expect(content.gates.find((g) => g.gate === coupler)?.kappa).toBe(0.1);
  });

  it('sends a content shifted by one step of the centre slider and shows the shift in GHz', () => {
    const onChange = vi.fn<(c: ConfigurationFile) => void>();
    const { rerender } = render(<TuningPanel content={content} circuitId="notch" onChange={onChange} />);
    fireEvent.keyDown(screen.getByRole('slider', { name: 'Centre frequency shift of circuit notch' }), { key: 'ArrowUp', which: 38, keyCode: 38 });
    const next = onChange.mock.calls[0]?.[0] as ConfigurationFile;
    const shift = centreShiftHz(content, next, 'notch');
    expect(shift).toBeGreaterThan(0);
    rerender(<TuningPanel content={next} circuitId="notch" onChange={onChange} />);
    expect(screen.getByText(`+${(shift / 1e9).toFixed(3)} GHz`)).toBeTruthy();
  });

  it('says so when the circuit is not in the configuration', () => {
    render(<TuningPanel content={content} circuitId="missing" onChange={() => undefined} />);
    expect(screen.getByText(/no circuit missing/)).toBeTruthy();
  });
});
