// The views of the response plots, their names in words and the units of their vertical axis.
import type { RfScheme } from '@hexloom/solver';

/** What a plot shows against frequency. */
export type PlotView = 'transmission' | 'phase' | 'delay' | 'dispersion' | 'rf';

/** How a trace is drawn: power in dB or linear, and the modulation of the RF view. */
export type TraceOptions = { referenceFrequencyHz: number; linear: boolean; rfScheme: RfScheme };

/** Tab titles of the views, in order. */
export const PLOT_VIEWS: readonly { id: PlotView; title: string }[] = [
  { id: 'transmission', title: 'Transmission' },
  { id: 'phase', title: 'Phase' },
  { id: 'delay', title: 'Group delay' },
  { id: 'dispersion', title: 'Dispersion' },
  { id: 'rf', title: 'RF response' },
];

/** The RF modulation schemes in words. */
export const RF_SCHEMES: readonly { id: RfScheme; label: string }[] = [
  { id: 'imdd', label: 'Intensity modulation, direct detection' },
  { id: 'ssb-upper', label: 'Single sideband, upper' },
  { id: 'ssb-lower', label: 'Single sideband, lower' },
];

/** Name and unit of the vertical axis of a view ("Group delay", "ps"). */
export function viewAxis(view: PlotView, linear: boolean): { quantity: string; unit: string } {
  if (view === 'transmission') return linear ? { quantity: 'Transmission', unit: 'power ratio' } : { quantity: 'Transmission', unit: 'dB' };
  if (view === 'phase') return { quantity: 'Phase, unwrapped', unit: 'rad' };
  if (view === 'delay') return { quantity: 'Group delay', unit: 'ps' };
  if (view === 'dispersion') return { quantity: 'Dispersion', unit: 'ps/GHz' };
  return { quantity: 'RF gain', unit: 'dB' };
}
