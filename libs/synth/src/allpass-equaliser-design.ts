/** All-pass ring stages whose summed group delay follows a target (flat delay or a slope) over a band. */
import { nelderMead } from './nelder-mead.js';
import { SynthInputError } from './synth-input-error.js';

export type AllPassStage = { selfCoupling: number; powerCoupling: number; resonanceOffsetHz: number };

export type AllPassEqualiserInput = {
  stages: number;
  /** Round-trip delay of one ring, s (perimeter * unit delay); its FSR is 1 / ringDelayS. */
  ringDelayS: number;
  bandHz: [number, number];
  /** Target group delay over the band, s, as a function of the frequency offset. */
  targetDelayS: (frequencyHz: number) => number;
  /** Constant delay the fit may add or remove (the bus path); true to fit only the shape. */
  freeOffset: boolean;
  /** Round-trip field amplitude a of each ring (1 for lossless; the chip's loss lowers and widens the delay peaks). */
  roundTripAmplitude?: number;
};

export type AllPassEqualiser = {
  stages: AllPassStage[];
  /** Constant part removed from the target when `freeOffset`, s. */
  offsetS: number;
  /** Root-mean-square and worst deviation of the fitted delay from the target over the band, s. */
  rmsErrorS: number;
  maxErrorS: number;
};

/** d/dphi of arg(1 - c e^{-j phi}) for real c: c (cos phi - c) / (1 - 2 c cos phi + c^2). */
const argSlope = (c: number, phi: number): number => (c * (Math.cos(phi) - c)) / (1 - 2 * c * Math.cos(phi) + c * c);

/**
 * Group delay of an all-pass ring H = (r - a e^{-j phi}) / (1 - r a e^{-j phi}), phi = 2 pi (f - f_res) T:
 * tau = T [s(r a) - s(a / r)] with s(c) = c (cos phi - c) / (1 - 2 c cos phi + c^2), from the phase of the ring
 * transmission (Yariv, Electron. Lett. 36(4), 2000). For a lossless ring (a = 1) it is
 * T (1 - r^2) / (1 - 2 r cos(phi) + r^2) (Madsen & Zhao, Optical Filter Design and Analysis, 1999, ch. 6).
 */
export function allPassStageDelayS(r: number, ringDelayS: number, frequencyHz: number, resonanceHz: number, roundTripAmplitude = 1): number {
  const phi = 2 * Math.PI * (frequencyHz - resonanceHz) * ringDelayS;
  const a = roundTripAmplitude;
  if (a === 1) return (ringDelayS * (1 - r * r)) / (1 - 2 * r * Math.cos(phi) + r * r);
  return ringDelayS * (argSlope(r * a, phi) - argSlope(a / r, phi));
}

/** Least-squares fit of the stage couplings and resonances to the target delay on 64 points of the band (Nelder–Mead). */
export function designAllPassEqualiser(input: AllPassEqualiserInput): AllPassEqualiser {
  const { stages, ringDelayS, bandHz, targetDelayS, freeOffset } = input;
  const a = input.roundTripAmplitude ?? 1;
  if (!(Number.isInteger(stages) && stages >= 1 && stages <= 6)) throw new SynthInputError(`synth: stages must be 1..6, got ${stages}`);
  const [lo, hi] = bandHz;
  if (!(hi > lo)) throw new SynthInputError(`synth: the band must have toHz above fromHz, got ${lo}..${hi}`);
  const fsr = 1 / ringDelayS;
  if (hi - lo >= fsr) throw new SynthInputError(`synth: the band (${hi - lo} Hz) must be narrower than the ring FSR (${fsr} Hz)`);
  const grid = Array.from({ length: 64 }, (_, i) => lo + ((hi - lo) * i) / 63);
  const target = grid.map(targetDelayS);
  // Parameters: per stage, an unbounded coupling variable u (r = 1 / (1 + e^-u)) and the resonance as a band fraction.
  const decode = (x: number[]): AllPassStage[] =>
    Array.from({ length: stages }, (_, k) => {
      const r = 1 / (1 + Math.exp(-(x[2 * k] as number)));
      return { selfCoupling: r, powerCoupling: 1 - r * r, resonanceOffsetHz: lo + (x[2 * k + 1] as number) * (hi - lo) };
    });
  const delays = (st: AllPassStage[]): number[] => grid.map((f) => st.reduce((s, stage) => s + allPassStageDelayS(stage.selfCoupling, ringDelayS, f, stage.resonanceOffsetHz, a), 0));
  const residual = (st: AllPassStage[]): { offset: number; errors: number[] } => {
    const d = delays(st);
    const offset = freeOffset ? d.reduce((s, v, i) => s + v - (target[i] as number), 0) / d.length : 0;
    return { offset, errors: d.map((v, i) => v - offset - (target[i] as number)) };
  };
  const cost = (x: number[]): number => residual(decode(x)).errors.reduce((s, e) => s + e * e, 0) / (ringDelayS * ringDelayS);
  const x0 = Array.from({ length: stages }, (_, k) => [1, (k + 0.5) / stages]).flat();
  let best = nelderMead(cost, x0, { step: 0.3, maxIterations: 4000 });
  for (let restart = 0; restart < 3; restart++) best = nelderMead(cost, best.x, { step: 0.1, maxIterations: 4000 });
  const stagesOut = decode(best.x);
  const { offset, errors } = residual(stagesOut);
  return {
    stages: stagesOut,
    offsetS: offset,
    rmsErrorS: Math.sqrt(errors.reduce((s, e) => s + e * e, 0) / errors.length),
    maxErrorS: Math.max(...errors.map(Math.abs)),
  };
}
