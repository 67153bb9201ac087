/** Targets of Mach–Zehnder lattices and transversal filters: stop-band rejection, or the shape of the asked response. */
import type { FilterSpecBody } from '@hexloom/contracts';
import { maskCheck } from './check-mask.js';
import { cAbs, polyOnCircle } from './complex.js';
import type { TargetResult } from './delay-targets.js';
import type { CircuitDesign } from './design-circuit.js';
import type { SampledResponse } from './mask-types.js';
import { bandNear } from './response-measures.js';

type LatticeSpec = Extract<FilterSpecBody, { kind: 'mzi-lattice' | 'transversal' }>;
type LatticeDesign = Extract<CircuitDesign, { kind: 'mzi-lattice' }>;

/** Where the target polynomial is compared with the simulation: within 10 dB of its peak. */
const SHAPE_FLOOR_DB = -10;

/**
 * Kaiser's transition width for a window of order N and stop-band attenuation A dB, as a fraction of the sampling
 * rate (here the lattice FSR): (A - 8) / (2.285 * 2 pi * N) (Oppenheim & Schafer, Discrete-Time Signal Processing, sec. 7.6).
 */
export function kaiserTransitionFraction(rejectionDb: number, order: number): number {
  return Math.max(0, rejectionDb - 8) / (2.285 * 2 * Math.PI * order);
}

/** Distance of `f` from `c` on a circle of circumference `period` (the lattice response is periodic in its FSR). */
const circularDistance = (f: number, c: number, period: number): number => Math.abs((((f - c) % period) + 1.5 * period) % period - period / 2);

/** Largest power on samples that `keep` selects (-Infinity when none). */
const maxWhere = (r: SampledResponse, keep: (f: number) => boolean): number => r.frequencyHz.reduce((m, f, i) => (keep(f) ? Math.max(m, r.powerDb[i] as number) : m), -Infinity);

/** Checks and figures of a lattice or transversal filter's single output. */
export function latticeTargets(spec: LatticeSpec, design: LatticeDesign, response: SampledResponse, unitDelayS: number): TargetResult {
  const fsr = design.latticeFsrHz;
  const order = design.lattice.stagePhasesRad.length;
  const peakDb = response.powerDb.reduce((m, p) => Math.max(m, p), -Infinity);
  if (spec.kind === 'transversal' || spec.band === 'polynomial') {
    // Shape: |H(f)|^2 against |A(w)|^2, w = 2 pi f delta T_u, both relative to their peaks (layer peeling realises
    // |A|^2 exactly on an ideal chip, Jinguji & Kawachi, J. Lightwave Technol. 13(1), 1995).
    const targetDb = response.frequencyHz.map((f) => 20 * Math.log10(Math.max(cAbs(polyOnCircle(design.target, 2 * Math.PI * f * design.armDifferenceUnits * unitDelayS)), 1e-15)));
    const targetPeak = targetDb.reduce((m, p) => Math.max(m, p), -Infinity);
    let error = 0;
    let at = 0;
    targetDb.forEach((t, i) => {
      if (t - targetPeak < SHAPE_FLOOR_DB) return;
      const e = Math.abs((response.powerDb[i] as number) - peakDb - (t - targetPeak));
      if (e > error) {
        error = e;
        at = response.frequencyHz[i] as number;
      }
    });
    return { checks: [[maskCheck('target', 'shape error against the asked response', 'dB', spec.shapeToleranceDb ?? 1, error, at, true)]], figures: [{ insertionLossDb: -peakDb, shapeErrorDb: error }] };
  }
  const centre = spec.band === 'half-band' ? 0 : spec.centreOffsetHz;
  const width = spec.band === 'half-band' ? fsr / 2 : (spec.widthHz ?? fsr / 2);
  const transition = kaiserTransitionFraction(spec.rejectionDb, order) * fsr;
  const inner = Math.max(0, width / 2 - transition / 2);
  const outer = width / 2 + transition / 2;
  const near = (f: number) => circularDistance(f, centre, fsr) <= inner;
  const far = (f: number) => circularDistance(f, centre, fsr) >= outer;
  const [passKeep, stopKeep] = spec.band === 'band-stop' ? [far, near] : [near, far];
  const passDb = maxWhere(response, passKeep);
  const stopDb = maxWhere(response, stopKeep);
  const rejectionDb = passDb - stopDb;
  const stopAt = response.frequencyHz.find((f, i) => stopKeep(f) && response.powerDb[i] === stopDb) ?? centre;
  const figures: Record<string, number> = { insertionLossDb: Number.isFinite(passDb) ? -passDb : -peakDb, ...(Number.isFinite(rejectionDb) ? { rejectionDb } : {}) };
  if (spec.band !== 'band-stop') {
    const b = bandNear(response, centre, width / 2);
    Object.assign(figures, { bandwidth3dBHz: b.widthHz, centreFrequencyHz: (b.lowHz + b.highHz) / 2 });
  }
  const limit = spec.rejectionDb - (spec.rejectionToleranceDb ?? 1);
  if (Number.isFinite(rejectionDb)) return { checks: [[maskCheck('target', 'stop-band rejection', 'dB', limit, rejectionDb, stopAt, false)]], figures: [figures] };
  // The transitions of this order leave no pass or no stop band: say which order would (Kaiser's formula solved for N).
  // Both bands exist when the transition is narrower than the band and than the rest of the FSR.
  const room = Math.min(width, fsr - width);
  const needed = Math.ceil(Math.max(0, spec.rejectionDb - 8) / (2.285 * 2 * Math.PI * (room / fsr)));
  const quantity = `stop-band rejection (order ${order} leaves no ${Number.isFinite(passDb) ? 'stop' : 'pass'} band for ${spec.rejectionDb} dB; Kaiser's formula asks order ${needed} or more)`;
  return { checks: [[maskCheck('target', quantity, 'dB', limit, 0, centre, false)]], figures: [figures] };
}
