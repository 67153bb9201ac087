/** From a specification to circuit numbers (couplings, lengths, lattice angles), before placement. */
import type { FilterSpecBody } from '@hexloom/contracts';
import type { TechnologyProfile } from '@hexloom/mesh';
import { unitDelayS } from '@hexloom/solver';
import { designAllPassEqualiser, type AllPassEqualiser } from './allpass-equaliser-design.js';
import { designCoupledRingBandpass, type CoupledRingDesign } from './coupled-ring-design.js';
import { cAbs, cScale, cx, polyOnCircle, type Complex } from './complex.js';
import { designFirTarget } from './fir-window-design.js';
import type { LatticeParameters } from './lattice-response.js';
import { peelLattice } from './layer-peeling.js';
import type { RealisationNote } from './realisation-note.js';
import { designAddDropRing, designAllPassRing, type AddDropDesign, type RingDesign } from './ring-design.js';
import { isRealisablePerimeter, perimeterForFsr } from './ring-perimeter.js';
import { SynthInputError } from './synth-input-error.js';

export type CircuitDesign =
  | { kind: 'delay-line'; delayS: number; toleranceS: number; bandHz: [number, number]; maxRippleS: number }
  | { kind: 'ttd-set'; stepS: number; baseS: number | undefined; toleranceS: number; bandHz: [number, number]; maxRippleS: number; maxImbalanceDb: number }
  | { kind: 'ring-notch'; perimeterUnits: number; ring: RingDesign; centreOffsetHz: number }
  | { kind: 'add-drop'; perimeterUnits: number; ring: AddDropDesign; centreOffsetHz: number }
  | { kind: 'coupled-ring-bandpass'; perimeterUnits: 6; chain: CoupledRingDesign; centreOffsetHz: number }
  | { kind: 'mzi-lattice'; armDifferenceUnits: number; target: Complex[]; lattice: LatticeParameters; couplerKappas: number[]; latticeFsrHz: number }
  | { kind: 'allpass-equaliser'; perimeterUnits: 6; equaliser: AllPassEqualiser };

export type DesignResult = { design: CircuitDesign; notes: RealisationNote[]; unitDelayS: number };

const RING_UNITS_SMALLEST = 6;

/** Band a delay is verified over when the spec names none: -1 .. +1 GHz around the carrier (a Hexloom default). */
export const DEFAULT_DELAY_BAND_HZ: [number, number] = [-1e9, 1e9];

/** The tolerances of a delay spec with their defaults: half a unit delay, a ripple of twice the tolerance. */
function delayLimits(spec: { tolerancePs?: number | undefined; bandHz?: { fromHz: number; toHz: number } | undefined; maxDelayRipplePs?: number | undefined }, tU: number) {
  const toleranceS = spec.tolerancePs === undefined ? tU / 2 : spec.tolerancePs * 1e-12;
  return {
    toleranceS,
    bandHz: (spec.bandHz ? [spec.bandHz.fromHz, spec.bandHz.toHz] : DEFAULT_DELAY_BAND_HZ) as [number, number],
    maxRippleS: spec.maxDelayRipplePs === undefined ? 2 * toleranceS : spec.maxDelayRipplePs * 1e-12,
  };
}

/** Perimeter for a ring spec: given, from an FSR, or the smallest ring (largest FSR) when free. */
function ringPerimeter(ring: { perimeterUnits: number } | { fsrHz: number } | { free: true }, tU: number): { perimeterUnits: number; notes: RealisationNote[] } {
  if ('perimeterUnits' in ring) {
    if (!isRealisablePerimeter(ring.perimeterUnits)) {
      throw new SynthInputError(`synth: a ring of ${ring.perimeterUnits} units cannot be drawn on a hexagonal mesh (6, 10, 12, 14, ... units)`);
    }
    return { perimeterUnits: ring.perimeterUnits, notes: [] };
  }
  if ('fsrHz' in ring) return perimeterForFsr(ring.fsrHz, tU);
  return { perimeterUnits: RING_UNITS_SMALLEST, notes: [] };
}

/** Wraps a frequency offset into [-FSR/2, FSR/2) as a fraction of the FSR. */
const wrapFraction = (offsetHz: number, fsrHz: number): number => {
  const f = offsetHz / fsrHz;
  return f - Math.floor(f + 0.5);
};

/**
 * Designs the circuit numbers for a specification on a chip technology. Ring couplings come from the ring
 * equations with the loss of one round trip (perimeter x loss per gate), coupled-ring chains from the low-pass
 * prototype, lattices from a Kaiser-window target by layer peeling (transversal taps are realised as the lattice
 * with the same polynomial), equalisers from a least-squares fit.
 */
export function designCircuit(spec: FilterSpecBody, technology: TechnologyProfile): DesignResult {
  const tU = unitDelayS({ unitLengthUm: technology.unitLengthUm, groupIndex: technology.groupIndex });
  const notes: RealisationNote[] = [];
  const lossPerUnitDb = technology.lossPerGateDb;
  switch (spec.kind) {
    case 'delay-line': {
      const delayS = 'ps' in spec.delay ? spec.delay.ps * 1e-12 : spec.delay.units * tU;
      return { design: { kind: 'delay-line', delayS, ...delayLimits(spec, tU) }, notes, unitDelayS: tU };
    }
    case 'ttd-set':
      return {
        design: { kind: 'ttd-set', stepS: spec.stepPs * 1e-12, baseS: spec.basePs === undefined ? undefined : spec.basePs * 1e-12, ...delayLimits(spec, tU), maxImbalanceDb: spec.maxImbalanceDb ?? 1 },
        notes,
        unitDelayS: tU,
      };
    case 'ring-notch': {
      const size = ringPerimeter(spec.ring, tU);
      notes.push(...size.notes);
      const fsrHz = 1 / (size.perimeterUnits * tU);
      const target = 'notchDepthDb' in spec.target ? { kind: 'notch-depth' as const, depthDb: spec.target.notchDepthDb, regime: spec.target.regime } : 'fwhmHz' in spec.target ? { kind: 'bandwidth' as const, fwhmHz: spec.target.fwhmHz } : { kind: 'critical' as const };
      const ring = designAllPassRing({ fsrHz, roundTripLossDb: size.perimeterUnits * lossPerUnitDb, target });
      return { design: { kind: 'ring-notch', perimeterUnits: size.perimeterUnits, ring, centreOffsetHz: spec.centreOffsetHz }, notes, unitDelayS: tU };
    }
    case 'add-drop': {
      const size = ringPerimeter(spec.ring, tU);
      notes.push(...size.notes);
      const fsrHz = 1 / (size.perimeterUnits * tU);
      const ring = designAddDropRing({ fsrHz, roundTripLossDb: size.perimeterUnits * lossPerUnitDb, fwhmHz: spec.bandwidthHz });
      return { design: { kind: 'add-drop', perimeterUnits: size.perimeterUnits, ring, centreOffsetHz: spec.centreOffsetHz }, notes, unitDelayS: tU };
    }
    case 'coupled-ring-bandpass': {
      if (spec.response === 'chebyshev' && spec.rippleDb === undefined) throw new SynthInputError('synth: a Chebyshev band-pass needs rippleDb');
      const ringFsrHz = 1 / (RING_UNITS_SMALLEST * tU);
      const chain = designCoupledRingBandpass({ kind: spec.response, order: spec.order, bandwidthHz: spec.bandwidthHz, ringFsrHz, ...(spec.rippleDb === undefined ? {} : { rippleDb: spec.rippleDb }) });
      return { design: { kind: 'coupled-ring-bandpass', perimeterUnits: 6, chain, centreOffsetHz: spec.centreOffsetHz }, notes, unitDelayS: tU };
    }
    case 'mzi-lattice':
    case 'transversal': {
      const armDifferenceUnits = spec.kind === 'mzi-lattice' ? spec.armDifferenceUnits : spec.tapDelayUnits;
      const latticeFsrHz = 1 / (armDifferenceUnits * tU);
      let target: Complex[];
      if (spec.kind === 'transversal') target = scaleBelowOne(spec.taps.map((t) => cx(t)), notes);
      else if (spec.band === 'polynomial') {
        if (!spec.coefficients || spec.coefficients.length !== spec.order + 1) throw new SynthInputError(`synth: a polynomial lattice of order ${spec.order} needs ${spec.order + 1} coefficients`);
        target = scaleBelowOne(spec.coefficients.map((c) => cx(c.re, c.im)), notes);
      } else {
        if (spec.band !== 'half-band' && spec.widthHz === undefined) throw new SynthInputError(`synth: a ${spec.band} lattice needs widthHz`);
        target = designFirTarget({
          band: spec.band,
          order: spec.order,
          centreFraction: wrapFraction(spec.centreOffsetHz, latticeFsrHz),
          widthFraction: (spec.widthHz ?? latticeFsrHz / 2) / latticeFsrHz,
          rejectionDb: spec.rejectionDb,
        });
      }
      const lattice = peelLattice(target);
      const couplerKappas = lattice.couplerAnglesRad.map((t) => Math.sin(t) ** 2);
      return { design: { kind: 'mzi-lattice', armDifferenceUnits, target, lattice, couplerKappas, latticeFsrHz }, notes, unitDelayS: tU };
    }
    case 'allpass-equaliser': {
      const ringDelayS = RING_UNITS_SMALLEST * tU;
      const { fromHz, toHz } = spec.band;
      const mid = (fromHz + toHz) / 2;
      const targetDelayS = 'delayPs' in spec.target ? () => (spec.target as { delayPs: number }).delayPs * 1e-12 : (f: number) => ((spec.target as { slopePsPerGHz: number }).slopePsPerGHz * 1e-12 * (f - mid)) / 1e9;
      // Each ring's round trip loses six gates' worth of loss: the fit uses the lossy ring delay (predistortion).
      const roundTripAmplitude = 10 ** (-(RING_UNITS_SMALLEST * lossPerUnitDb) / 20);
      const equaliser = designAllPassEqualiser({ stages: spec.stages, ringDelayS, bandHz: [fromHz, toHz], targetDelayS, freeOffset: !('delayPs' in spec.target), roundTripAmplitude });
      return { design: { kind: 'allpass-equaliser', perimeterUnits: 6, equaliser }, notes, unitDelayS: tU };
    }
  }
}

/**
 * Scales a polynomial so that max |A|^2 on the unit circle is 0.999 (a passive lattice needs |A| <= 1), and says so
 * in a note: the realised response is the requested one times that factor.
 */
function scaleBelowOne(a: Complex[], notes: RealisationNote[]): Complex[] {
  let peak = 0;
  for (let k = 0; k < 2048; k++) peak = Math.max(peak, cAbs(polyOnCircle(a, (2 * Math.PI * k) / 2048)));
  if (peak === 0) throw new SynthInputError('synth: the polynomial is zero everywhere');
  const scale = Math.sqrt(0.999) / peak;
  notes.push({ quantity: 'response scale', requested: 1, achieved: scale, unit: 'x', note: `the requested response peaks at |A|^2 = ${(peak * peak).toPrecision(6)}; a passive lattice needs |A| <= 1, so every coefficient was multiplied by ${scale.toPrecision(6)} (peak |A|^2 = 0.999, ${(20 * Math.log10(scale)).toFixed(3)} dB)` });
  return a.map((c) => cScale(c, scale));
}
