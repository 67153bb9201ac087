// The plotted series of one spectrum in one view: x in GHz (offset from the carrier, or RF tone), y in the view's unit.
import type { SpectrumFile } from '@hexloom/contracts';
import { derivative } from './derivative.js';
import type { PlotView, TraceOptions } from './plotViews.js';
import { rfFromSpectrum } from './rfFromSpectrum.js';
import { unwrapPhase } from './unwrapPhase.js';

/** x (GHz) and y (the view's unit; null where not finite, e.g. the dB of an exact zero). */
export type TraceSeries = { xGhz: number[]; y: (number | null)[] };

const finite = (v: number | null | undefined): number | null => (v === null || v === undefined || !Number.isFinite(v) ? null : v);

/** Offsets of the spectrum's points from `referenceFrequencyHz`, Hz. */
export function offsetsFrom(spectrum: SpectrumFile, referenceFrequencyHz: number): number[] {
  return spectrum.points.frequencyHz.map((f) => f - referenceFrequencyHz);
}

/**
 * The series of `view`: transmission |H|^2 in dB or as a power ratio, unwrapped phase (rad), group delay (ps),
 * dispersion as d tau / d f (ps/GHz), or the RF gain (dB) against the RF tone with the carrier at the reference.
 */
export function traceSeries(spectrum: SpectrumFile, view: PlotView, options: TraceOptions): TraceSeries {
  const offsetsHz = offsetsFrom(spectrum, options.referenceFrequencyHz);
  const xGhz = offsetsHz.map((f) => f / 1e9);
  const { re, im, amplitudeDb, phaseDeg, groupDelayPs } = spectrum.points;
  if (view === 'transmission') {
    if (!options.linear) return { xGhz, y: amplitudeDb.map(finite) };
    return { xGhz, y: re.map((r, i) => r * r + (im[i] ?? 0) ** 2) };
  }
  if (view === 'phase') return { xGhz, y: unwrapPhase(phaseDeg.map((d) => (d * Math.PI) / 180)) };
  const delay = groupDelayPs.map(finite);
  if (view === 'delay') return { xGhz, y: delay };
  if (view === 'dispersion') return { xGhz, y: derivative(xGhz, delay) };
  const rf = rfFromSpectrum({ offsetsHz, re, im }, 0, options.rfScheme);
  return { xGhz: rf.rfFrequenciesHz.map((f) => f / 1e9), y: rf.gainDb };
}
