// Centre-frequency tuning of a circuit's loops: the round-trip phase of each loop, read and set as a shift in Hz.
import type { ConfigurationFile } from '@hexloom/contracts';
import { circuitKnobs, gatePhaseRad } from './circuitKnobs.js';
import { setGatePhase } from './setGatePhase.js';

/**
 * A loop of L units resonates where its round-trip phase at f0 equals 2 pi f_c L T_u (ring resonance condition,
 * Yariv, Electron. Lett. 2000, with z^-1 = exp(-j 2 pi (f - f0) T_u)), so adding d phi to it moves the resonance by
 * d phi / (2 pi L T_u). Shift (Hz) of the first loop of `circuitId` in `content` from `baseline`; 0 without loops.
 */
export function centreShiftHz(baseline: ConfigurationFile, content: ConfigurationFile, circuitId: string): number {
  const knobs = circuitKnobs(baseline, circuitId);
  const loop = knobs?.loops[0];
  if (!knobs || !loop) return 0;
  const delta = gatePhaseRad(content, loop.tunerGate) - gatePhaseRad(baseline, loop.tunerGate);
  return delta / (2 * Math.PI * loop.lengthUnits * knobs.unitDelayS);
}

/**
 * `content` with every loop of `circuitId` moved `shiftHz` from where it resonates in `baseline`: each loop's tuner
 * phase becomes its baseline phase plus 2 pi shift L T_u (loops of different lengths keep their alignment).
 */
export function withCentreShift(baseline: ConfigurationFile, content: ConfigurationFile, circuitId: string, shiftHz: number): ConfigurationFile {
  const knobs = circuitKnobs(baseline, circuitId);
  if (!knobs) return content;
  return knobs.loops.reduce(
    (next, loop) => setGatePhase(next, circuitId, loop.tunerGate, gatePhaseRad(baseline, loop.tunerGate) + 2 * Math.PI * shiftHz * loop.lengthUnits * knobs.unitDelayS),
    content,
  );
}

/** Widest shift (Hz) either way: half the free spectral range 1 / (L T_u) of the circuit's shortest loop; 0 without loops. */
export function centreShiftRangeHz(content: ConfigurationFile, circuitId: string): number {
  const knobs = circuitKnobs(content, circuitId);
  if (!knobs || knobs.loops.length === 0) return 0;
  const shortest = Math.min(...knobs.loops.map((l) => l.lengthUnits));
  return 1 / (2 * shortest * knobs.unitDelayS);
}
