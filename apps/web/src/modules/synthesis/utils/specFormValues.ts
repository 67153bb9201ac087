// What the synthesis drawer's forms hold: every number as typed text, in the units the user sees (GHz, ps, dB, units).

/** A port the user may pick: `ref` is what the spec sends (the label, or the id of an unlabelled port). */
export type PortOption = { ref: string; label: string; wiredTo: string };

/** How a ring's size is asked for: the smallest ring, a perimeter, or an FSR. */
export type RingSizeValues = { ringMode: 'free' | 'perimeter' | 'fsr'; perimeterUnits: string; fsrGHz: string };

/** The band a delay must hold over, GHz offsets (both empty: the default band). */
export type DelayBandValues = { bandFromGHz: string; bandToGHz: string; maxDelayRipplePs: string };

export type DelayLineValues = DelayBandValues & {
  kind: 'delay-line';
  from: string;
  to: string;
  delayMode: 'ps' | 'units';
  delay: string;
  tolerancePs: string;
};

export type TtdSetValues = DelayBandValues & {
  kind: 'ttd-set';
  from: string;
  outputs: string[];
  stepPs: string;
  basePs: string;
  tolerancePs: string;
  maxImbalanceDb: string;
};

export type RingNotchValues = RingSizeValues & {
  kind: 'ring-notch';
  from: string;
  to: string;
  centreOffsetGHz: string;
  targetMode: 'depth' | 'fwhm' | 'critical';
  notchDepthDb: string;
  regime: 'under' | 'over';
  fwhmGHz: string;
  depthToleranceDb: string;
  widthTolerancePercent: string;
};

export type AddDropValues = RingSizeValues & {
  kind: 'add-drop';
  from: string;
  through: string;
  drop: string;
  centreOffsetGHz: string;
  bandwidthGHz: string;
  widthTolerancePercent: string;
};

export type CoupledRingBandpassValues = {
  kind: 'coupled-ring-bandpass';
  from: string;
  to: string;
  through: string;
  response: 'butterworth' | 'chebyshev';
  order: string;
  rippleDb: string;
  bandwidthGHz: string;
  centreOffsetGHz: string;
  widthTolerancePercent: string;
};

export type MziLatticeValues = {
  kind: 'mzi-lattice';
  from: string;
  to: string;
  band: 'band-pass' | 'band-stop' | 'half-band' | 'polynomial';
  order: string;
  armDifferenceUnits: string;
  centreOffsetGHz: string;
  widthGHz: string;
  rejectionDb: string;
  /** Comma-separated coefficients of A(z), each real ("0.5") or complex ("0.5+0.2j"). */
  coefficients: string;
  rejectionToleranceDb: string;
  shapeToleranceDb: string;
};

export type TransversalValues = {
  kind: 'transversal';
  from: string;
  to: string;
  /** Comma-separated relative field amplitudes. */
  taps: string;
  tapDelayUnits: string;
  shapeToleranceDb: string;
};

export type AllPassEqualiserValues = {
  kind: 'allpass-equaliser';
  from: string;
  to: string;
  bandFromGHz: string;
  bandToGHz: string;
  targetMode: 'delay' | 'slope';
  delayPs: string;
  slopePsPerGHz: string;
  stages: string;
  tolerancePs: string;
};

/** The form of one spec kind. */
export type SpecFormValues =
  | DelayLineValues
  | TtdSetValues
  | RingNotchValues
  | AddDropValues
  | CoupledRingBandpassValues
  | MziLatticeValues
  | TransversalValues
  | AllPassEqualiserValues;

/** One row of the mask table; `key` only keeps React rows stable. */
export type MaskRow = {
  key: string;
  kind: 'pass' | 'stop' | 'delay';
  fromGHz: string;
  toGHz: string;
  maxInsertionLossDb: string;
  maxRippleDb: string;
  minRejectionDb: string;
  maxDelayRipplePs: string;
  delayPs: string;
  delayTolerancePs: string;
  /** A port ref, or '' for the circuit's main outputs. */
  port: string;
};

/** Errors in words, keyed by the path of the value in the synthesise body ("spec.spec.bandwidthHz"). */
export type FieldErrors = Record<string, string>;

/** Props every spec kind's form takes. */
export type KindFormProps<V extends SpecFormValues> = {
  values: V;
  onChange: (next: V) => void;
  ports: PortOption[];
  errors: FieldErrors;
};
