/** Transfer matrix of one gate traversal: a balanced MZI of two 3 dB couplers, with loss and imbalance. */
import { SolverInputError } from './unit-delay.js';

/**
 * A 2x2 complex transfer, `t[out][in]`, stored flat as
 * `[t00re, t00im, t01re, t01im, t10re, t10im, t11re, t11im]`.
 * Index 0 is the waveguide on the gate's first side (side a), index 1 the other side (side b):
 * t00/t11 are bar, t01/t10 are cross.
 */
export type Transfer2x2 = Float64Array;

/** Per-gate perturbations, for tolerance and Monte Carlo studies (all default to 0). */
export type GatePerturbation = {
  /** Error added to the internal phase theta, radians. */
  thetaErrorRad?: number;
  /** Error added to the outer phase phi, radians. */
  phiErrorRad?: number;
  /** Extra splitting-angle error of the first coupler, radians (ideal 3 dB coupler: pi/4). */
  coupler1ErrorRad?: number;
  /** Extra splitting-angle error of the second coupler, radians. */
  coupler2ErrorRad?: number;
};

export type GateTransferInput = GatePerturbation & {
  /** Internal phase theta of the MZI, radians: power cross-coupling kappa = cos^2(theta / 2). */
  thetaRad: number;
  /** Outer phase phi, radians, applied to the side-a output. */
  phiRad: number;
  /** Insertion loss of one traversal (gate + corner bend), dB of power. */
  lossDb: number;
  /** Extinction ratio of the gate in bar and in cross, dB; Infinity for ideal couplers. */
  extinctionDb: number;
};

/**
 * Splitting-angle error of the first coupler that gives the stated extinction ratio (wanted over unwanted
 * output power) in bar and cross: epsilon = atan(10^(-ER/20)).
 * With couplers of angles pi/4 + e1 and pi/4 + e2 the MZI leaks sin^2(e2 - e1) of the power in bar
 * and sin^2(e1 + e2) in cross (Madsen & Zhao, Optical Filter Design and Analysis, 1999, ch. 3, MZI with
 * non-ideal couplers); putting the whole imbalance on the first coupler (e2 = 0) makes both leakages
 * equal to sin^2(epsilon), and the ratio to the wanted output tan^2(epsilon) = 10^(-ER/10).
 */
export function couplerImbalanceRad(extinctionDb: number): number {
  if (Number.isNaN(extinctionDb) || extinctionDb < 0) {
    throw new SolverInputError(`solver: extinctionDb must be a number of dB >= 0, got ${extinctionDb}`);
  }
  if (extinctionDb === Infinity) return 0;
  return Math.atan(10 ** (-extinctionDb / 20));
}

/** Internal phase theta (radians, in [0, pi]) that gives power cross-coupling kappa = cos^2(theta/2). */
export function thetaForKappa(kappa: number): number {
  if (!(kappa >= 0 && kappa <= 1)) {
    throw new SolverInputError(`solver: kappa must be within [0, 1], got ${kappa}`);
  }
  return 2 * Math.acos(Math.sqrt(kappa));
}

/**
 * Transfer of one gate traversal T = a * P(phi) * C2 * P(theta) * C1, with couplers
 * C = [[cos x, j sin x], [j sin x, cos x]] (x = pi/4 + error), inner phase P(theta) = diag(e^{j theta}, 1),
 * outer phase P(phi) = diag(e^{j phi}, 1) and amplitude a = 10^(-lossDb/20).
 * Ideal couplers give |t01|^2 = cos^2(theta/2): theta = 0 is cross, theta = pi is bar.
 * The reverse direction of the same gate is the transpose (reciprocity): see {@link transposeTransfer}.
 */
export function gateTransfer(input: GateTransferInput): Transfer2x2 {
  const { thetaRad, phiRad, lossDb } = input;
  if (!Number.isFinite(thetaRad) || !Number.isFinite(phiRad)) {
    throw new SolverInputError(`solver: gate phases must be finite, got theta=${thetaRad}, phi=${phiRad}`);
  }
  if (!(Number.isFinite(lossDb) && lossDb >= 0)) {
    throw new SolverInputError(`solver: lossDb must be a finite number >= 0, got ${lossDb}`);
  }
  const x1 = Math.PI / 4 + couplerImbalanceRad(input.extinctionDb) + (input.coupler1ErrorRad ?? 0);
  const x2 = Math.PI / 4 + (input.coupler2ErrorRad ?? 0);
  const theta = thetaRad + (input.thetaErrorRad ?? 0);
  const phi = phiRad + (input.phiErrorRad ?? 0);
  const c1 = Math.cos(x1), s1 = Math.sin(x1), c2 = Math.cos(x2), s2 = Math.sin(x2);
  const er = Math.cos(theta), ei = Math.sin(theta);
  // M = C2 * diag(e, 1) * C1, written out: M = [[c2 e c1 - s2 s1, j(c2 e s1 + s2 c1)], [j(s2 e c1 + c2 s1), c2 c1 - s2 e s1]].
  const m00r = c2 * c1 * er - s2 * s1, m00i = c2 * c1 * ei;
  const m01r = -c2 * s1 * ei, m01i = c2 * s1 * er + s2 * c1;
  const m10r = -s2 * c1 * ei, m10i = s2 * c1 * er + c2 * s1;
  const m11r = c2 * c1 - s2 * s1 * er, m11i = -s2 * s1 * ei;
  const a = 10 ** (-lossDb / 20);
  const pr = a * Math.cos(phi), pi = a * Math.sin(phi);
  return Float64Array.of(
    pr * m00r - pi * m00i, pr * m00i + pi * m00r,
    pr * m01r - pi * m01i, pr * m01i + pi * m01r,
    a * m10r, a * m10i,
    a * m11r, a * m11i,
  );
}

/** Transfer of the reverse traversal of a reciprocal 2x2: the transpose (t01 and t10 swapped). */
export function transposeTransfer(t: Transfer2x2): Transfer2x2 {
  return Float64Array.of(t[0] ?? 0, t[1] ?? 0, t[4] ?? 0, t[5] ?? 0, t[2] ?? 0, t[3] ?? 0, t[6] ?? 0, t[7] ?? 0);
}

/** Ideal lossless 2x2 from power cross-coupling kappa: [[sqrt(1-k), -j sqrt(k)], [-j sqrt(k), sqrt(1-k)]] times a. */
export function couplerTransfer(kappa: number, lossDb = 0): Transfer2x2 {
  if (!(kappa >= 0 && kappa <= 1)) throw new SolverInputError(`solver: kappa must be within [0, 1], got ${kappa}`);
  const a = 10 ** (-lossDb / 20);
  const t = a * Math.sqrt(1 - kappa), k = a * Math.sqrt(kappa);
  return Float64Array.of(t, 0, 0, -k, 0, -k, t, 0);
}
