// The request each spec kind's form starts from: the repository's example specs, with the documented default tolerances.
import type { FilterSpec, FilterSpecKind } from '@hexloom/contracts';

/** One starting spec per kind (examples/synth/*.spec.json; tolerances from docs/formats.md, "Targets"). */
export const DEFAULT_SPECS: Record<FilterSpecKind, FilterSpec> = {
  'delay-line': {
    schemaVersion: 1,
    name: '400 ps reference delay',
    spec: { kind: 'delay-line', from: 'W01', to: 'E01', delay: { ps: 400 }, tolerancePs: 10, bandHz: { fromHz: -1e9, toHz: 1e9 } },
    mask: { regions: [{ kind: 'delay', range: { fromHz: -10e9, toHz: 10e9 }, delayPs: 400, delayTolerancePs: 10 }] },
  },
  'ttd-set': {
    schemaVersion: 1,
    name: 'Four-output true-time-delay set',
    spec: { kind: 'ttd-set', from: 'W20', outputs: ['E09', 'E13', 'E21', 'E25'], stepPs: 37.5, tolerancePs: 5, bandHz: { fromHz: -1e9, toHz: 1e9 }, maxDelayRipplePs: 10, maxImbalanceDb: 1 },
    mask: { regions: [] },
  },
  'ring-notch': {
    schemaVersion: 1,
    name: 'Tunable notch at +3 GHz',
    spec: { kind: 'ring-notch', from: 'W03', to: 'E03', centreOffsetHz: 3e9, target: { notchDepthDb: 20, regime: 'under' }, ring: { free: true }, depthToleranceDb: 1 },
    mask: { regions: [{ kind: 'stop', range: { fromHz: 2.98e9, toHz: 3.02e9 }, minRejectionDb: 15 }] },
  },
  'add-drop': {
    schemaVersion: 1,
    name: 'Add-drop channel at −2 GHz',
    spec: { kind: 'add-drop', from: 'W25', through: 'E25', drop: 'E27', centreOffsetHz: -2e9, bandwidthHz: 1.5e9, ring: { perimeterUnits: 6 }, widthTolerancePercent: 15 },
    mask: { regions: [] },
  },
  'coupled-ring-bandpass': {
    schemaVersion: 1,
    name: 'Coupled-ring band-pass, 1.2 GHz at +2 GHz',
    spec: { kind: 'coupled-ring-bandpass', from: 'W11', to: 'E11', through: 'W14', response: 'butterworth', order: 3, bandwidthHz: 1.2e9, centreOffsetHz: 2e9, widthTolerancePercent: 15 },
    mask: {
      regions: [
        { kind: 'pass', range: { fromHz: 1.8e9, toHz: 2.2e9 }, maxRippleDb: 1.5 },
        { kind: 'stop', range: { fromHz: 5e9, toHz: 7e9 }, minRejectionDb: 25 },
      ],
    },
  },
  'mzi-lattice': {
    schemaVersion: 1,
    name: 'Lattice band-pass',
    spec: { kind: 'mzi-lattice', from: 'W30', to: 'E30', band: 'band-pass', order: 4, armDifferenceUnits: 2, centreOffsetHz: 8e9, widthHz: 20e9, rejectionDb: 20, rejectionToleranceDb: 1 },
    mask: { regions: [] },
  },
  transversal: {
    schemaVersion: 1,
    name: 'Three-tap transversal notch',
    spec: { kind: 'transversal', from: 'W07', to: 'E07', taps: [1, 2, 1], tapDelayUnits: 2, shapeToleranceDb: 1 },
    mask: { regions: [] },
  },
  'allpass-equaliser': {
    schemaVersion: 1,
    name: 'Two-stage delay equaliser',
    spec: { kind: 'allpass-equaliser', from: 'W33', to: 'E33', band: { fromHz: 1e9, toHz: 4e9 }, target: { slopePsPerGHz: 3 }, stages: 2 },
    mask: { regions: [] },
  },
};
