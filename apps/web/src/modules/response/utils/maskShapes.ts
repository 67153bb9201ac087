// What the plot draws of a mask: each region's band, its limit lines, and where the curve breaks them (fail shading).
import type { Mask, MaskRegion, SpectrumFile } from '@hexloom/contracts';
import type { PlotView } from './plotViews.js';
import type { TraceSeries } from './traceSeries.js';

/** A limit of a region in the view's unit: the curve must stay above a `min` and below a `max`. */
export type MaskLimit = { y: number; side: 'min' | 'max' };

/** One region as drawn: band edges (GHz), limits, and the sub-bands where the curve violates them. */
export type MaskShape = { kind: MaskRegion['kind']; x0Ghz: number; x1Ghz: number; limits: MaskLimit[]; fails: { x0Ghz: number; x1Ghz: number }[] };

/** The trace a region applies to: the spectrum whose output is the region's port (id or name), else the first. */
export function traceIndexOf(region: MaskRegion, spectra: readonly SpectrumFile[]): number {
  if (!region.port) return 0;
  const i = spectra.findIndex((s) => s.to === region.port || s.toName === region.port);
  return i < 0 ? 0 : i;
}

const within = (series: TraceSeries, x0: number, x1: number): number[] => series.xGhz.flatMap((x, i) => (x >= x0 && x <= x1 ? [i] : []));
const valuesAt = (series: TraceSeries, idx: number[]): number[] => idx.flatMap((i) => (series.y[i] == null ? [] : [series.y[i] as number]));

/** Limits in dB (transmission) or ps (delay) of one region; rejection is counted from the pass-band peak (common practice for filter masks). */
function limitsOf(region: MaskRegion, series: TraceSeries, idx: number[], peakDb: number, view: PlotView): MaskLimit[] {
  const values = valuesAt(series, idx);
  if (view === 'transmission' && region.kind === 'pass') {
    const out: MaskLimit[] = [];
    if (region.maxInsertionLossDb !== undefined) out.push({ y: -region.maxInsertionLossDb, side: 'min' });
    if (region.maxRippleDb !== undefined && values.length > 0) out.push({ y: Math.max(...values) - region.maxRippleDb, side: 'min' });
    return out;
  }
  if (view === 'transmission' && region.kind === 'stop') return [{ y: peakDb - region.minRejectionDb, side: 'max' }];
  if (view === 'delay' && region.kind === 'delay') {
    const out: MaskLimit[] = [];
    if (region.delayPs !== undefined && region.delayTolerancePs !== undefined) out.push({ y: region.delayPs - region.delayTolerancePs, side: 'min' }, { y: region.delayPs + region.delayTolerancePs, side: 'max' });
    if (region.maxDelayRipplePs !== undefined && values.length > 0) {
      const mid = (Math.max(...values) + Math.min(...values)) / 2;
      out.push({ y: mid - region.maxDelayRipplePs / 2, side: 'min' }, { y: mid + region.maxDelayRipplePs / 2, side: 'max' });
    }
    return out;
  }
  return [];
}

/** Runs of consecutive samples that break a limit, as bands widened by half a step on each side. */
function failBands(series: TraceSeries, idx: number[], limits: MaskLimit[]): { x0Ghz: number; x1Ghz: number }[] {
  const bad = (i: number): boolean => {
    const y = series.y[i];
    if (y == null) return limits.some((l) => l.side === 'min');
    return limits.some((l) => (l.side === 'min' ? y < l.y : y > l.y));
  };
  const step = series.xGhz.length > 1 ? Math.abs((series.xGhz[1] ?? 0) - (series.xGhz[0] ?? 0)) / 2 : 0;
  const bands: { x0Ghz: number; x1Ghz: number }[] = [];
  const close = (run: [number, number]) => bands.push({ x0Ghz: (series.xGhz[run[0]] ?? 0) - step, x1Ghz: (series.xGhz[run[1]] ?? 0) + step });
  let run: [number, number] | null = null;
  for (const i of idx) {
    if (!bad(i)) {
      if (run) close(run);
      run = null;
    } else if (run && i === run[1] + 1) run[1] = i;
    else {
      if (run) close(run);
      run = [i, i];
    }
  }
  if (run) close(run);
  return bands;
}

/**
 * The regions of `mask` that `view` can show (pass and stop on transmission, delay on group delay), each checked
 * on its trace; `seriesOf` gives a trace in dB (transmission) or ps (delay). `linear` converts dB limits to power ratios. Regions of other views are left out.
 */
export function maskShapes(mask: Mask, spectra: readonly SpectrumFile[], seriesOf: (index: number) => TraceSeries, view: PlotView, linear: boolean): MaskShape[] {
  if (view !== 'transmission' && view !== 'delay') return [];
  const toGhz = (hz: number): number => hz / 1e9;
  const passIdx = (index: number) => mask.regions.filter((r) => r.kind === 'pass' && traceIndexOf(r, spectra) === index).flatMap((r) => within(seriesOf(index), toGhz(r.range.fromHz), toGhz(r.range.toHz)));
  const shapes: MaskShape[] = [];
  for (const region of mask.regions) {
    const wanted = view === 'delay' ? region.kind === 'delay' : region.kind !== 'delay';
    if (!wanted) continue;
    const index = traceIndexOf(region, spectra);
    const dbSeries = seriesOf(index);
    const x0Ghz = toGhz(region.range.fromHz), x1Ghz = toGhz(region.range.toHz);
    const idx = within(dbSeries, x0Ghz, x1Ghz);
    const pass = passIdx(index);
    const peakValues = valuesAt(dbSeries, pass.length > 0 ? pass : dbSeries.xGhz.map((_, i) => i));
    const peakDb = peakValues.length > 0 ? Math.max(...peakValues) : 0;
    const limits = limitsOf(region, dbSeries, idx, peakDb, view);
    const fails = failBands(dbSeries, idx, limits);
    const shown = linear && view === 'transmission' ? limits.map((l) => ({ ...l, y: 10 ** (l.y / 10) })) : limits;
    shapes.push({ kind: region.kind, x0Ghz, x1Ghz, limits: shown, fails });
  }
  return shapes;
}
