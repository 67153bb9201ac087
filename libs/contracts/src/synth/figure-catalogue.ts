/** Which figures each kind of specification reports for its outputs, with their units: what the API and files quote. */
import { z } from 'zod';
import type { FilterSpecKind } from './filter-spec.js';

export const figureUnitSchema = z.enum(['dB', 'Hz', 'ps', 'ps/GHz', 'count']);
export type FigureUnit = z.infer<typeof figureUnitSchema>;

/** One figure: its name (units in the name: ...Db, ...Hz, ...Ps), unit and a plain label. */
export const figureDefinitionSchema = z.object({ name: z.string(), unit: figureUnitSchema, label: z.string() });
export type FigureDefinition = z.infer<typeof figureDefinitionSchema>;

const f = (name: string, unit: FigureUnit, label: string): FigureDefinition => ({ name, unit, label });

const DELAY: FigureDefinition[] = [
  f('delayAtCarrierPs', 'ps', 'group delay at the carrier'),
  f('targetDelayPs', 'ps', 'requested delay'),
  f('delayErrorPs', 'ps', 'delay error at the carrier'),
  f('delayRippleInBandPs', 'ps', 'peak-to-peak delay ripple over the band'),
  f('meanDelayInBandPs', 'ps', 'mean delay over the band'),
  f('insertionLossDb', 'dB', 'insertion loss at the carrier'),
];
const BAND_PASS: FigureDefinition[] = [
  f('insertionLossDb', 'dB', 'insertion loss at the pass-band peak'),
  f('centreFrequencyHz', 'Hz', 'centre of the pass band'),
  f('bandwidthHz', 'Hz', 'pass-band width (3 dB, or the ripple level for Chebyshev)'),
  f('bandLowHz', 'Hz', 'lower band edge'),
  f('bandHighHz', 'Hz', 'upper band edge'),
  f('passbandRippleDb', 'dB', 'pass-band ripple'),
  f('rejectionDb', 'dB', 'rejection two band widths or more from the centre'),
  f('delayRippleInBandPs', 'ps', 'delay ripple inside the pass band'),
  f('meanDelayInBandPs', 'ps', 'mean delay inside the pass band'),
];

/** The figures of each spec kind's main outputs (a delay set: every output; `@<port>` is appended when saved). */
export const FIGURE_CATALOGUE: Record<FilterSpecKind, FigureDefinition[]> = {
  'delay-line': DELAY,
  'ttd-set': [...DELAY, f('stepErrorPs', 'ps', 'step from the previous output minus the requested step'), f('imbalanceDb', 'dB', 'power below the strongest output')],
  'ring-notch': [f('notchDepthDb', 'dB', 'notch depth below the off-resonance level'), f('notchFrequencyHz', 'Hz', 'notch frequency'), f('notchWidthHz', 'Hz', 'notch width at half depth'), f('insertionLossDb', 'dB', 'off-resonance insertion loss')],
  'add-drop': BAND_PASS,
  'coupled-ring-bandpass': BAND_PASS,
  'mzi-lattice': [
    f('insertionLossDb', 'dB', 'insertion loss in the pass band'),
    f('rejectionDb', 'dB', 'stop-band rejection'),
    f('bandwidth3dBHz', 'Hz', '3 dB width of the pass band'),
    f('centreFrequencyHz', 'Hz', 'centre of the pass band'),
    f('shapeErrorDb', 'dB', 'largest error against the asked response (polynomial)'),
  ],
  transversal: [f('insertionLossDb', 'dB', 'insertion loss at the peak'), f('shapeErrorDb', 'dB', 'largest error against the taps\' response')],
  'allpass-equaliser': [
    f('meanExcessDelayPs', 'ps', 'mean delay over the bus delay, in band'),
    f('delaySlopePsPerGHz', 'ps/GHz', 'least-squares delay slope in band'),
    f('delayErrorPs', 'ps', 'largest delay error against the target in band'),
    f('delayRippleInBandPs', 'ps', 'peak-to-peak delay in band'),
    f('insertionLossDb', 'dB', 'insertion loss in band'),
    f('amplitudeRippleDb', 'dB', 'amplitude ripple in band'),
  ],
};

/** Figures saved for every circuit besides its kind's: how many of its checks failed. */
export const VERDICT_FIGURES: FigureDefinition[] = [f('failedChecks', 'count', 'mask and target checks failed, over every output'), f('checks', 'count', 'mask and target checks made')];

/** GET /api/figures answer. */
export const figureCatalogueAnswerSchema = z.object({ kinds: z.record(z.string(), z.array(figureDefinitionSchema)), verdict: z.array(figureDefinitionSchema) });
export type FigureCatalogueAnswer = z.infer<typeof figureCatalogueAnswerSchema>;
