// The rows of the gate table: every live gate's state, coupler and phases, and the heater drive each shifter needs.
import { driveForPhase, shifterTargets, type ShifterCalibration } from '@hexloom/bench';
import type { ConfigurationFile, ShifterCalibrationBody } from '@hexloom/contracts';
import { buildMesh, gateKappa } from '@hexloom/mesh';

/** One gate: settings, both shifters' target phases and drives (SI units), and whether a drive exceeds its limit. */
export type GateRow = {
  gate: string;
  state: 'bar' | 'cross' | 'split' | 'idle';
  circuit: string;
  kappa: number;
  thetaRad: number;
  phiRad: number;
  thetaVoltageV: number;
  phiVoltageV: number;
  currentA: number;
  powerW: number;
  overLimit: boolean;
  /** Where the drive figures come from: the chip's calibration, or the technology's nominal shifter. */
  source: 'calibration' | 'nominal';
};

/**
 * Drives by P = P_pi ((phase - offset) mod 2 pi) / pi, V = sqrt(P R) (thermal shifter, common practice), power and current summed over a
 * gate's two shifters (theta for the coupler, phi for the outer phase).
 */
export function gateRows(content: ConfigurationFile, calibration: readonly ShifterCalibrationBody[] = []): GateRow[] {
  const mesh = buildMesh(content.mesh);
  const calibrated = new Map(calibration.map((c) => [`${c.gate}:${c.shifter}`, c]));
  const nominal = content.mesh.technology.phaseShifter;
  const explicit = new Set(content.gates.map((g) => g.gate));
  const rows = new Map<string, GateRow>();
  for (const target of shifterTargets(mesh, content)) {
    const own = calibrated.get(`${target.gate}:${target.shifter}`);
    const cal: ShifterCalibration = own ?? { gate: target.gate, shifter: target.shifter, offsetRad: 0, piPowerW: nominal.piPowerW, resistanceOhm: nominal.resistanceOhm, maxPowerW: nominal.maxPowerW, maxVoltageV: nominal.maxVoltageV };
    const drive = driveForPhase(cal, target.phaseRad);
    const s = target.setting;
    const row = rows.get(target.gate) ?? {
      gate: target.gate,
      state: explicit.has(target.gate) ? s.state : 'idle',
      circuit: s.circuit ?? '',
      kappa: gateKappa(s),
      thetaRad: 0,
      phiRad: 0,
      thetaVoltageV: 0,
      phiVoltageV: 0,
      currentA: 0,
      powerW: 0,
      overLimit: false,
      source: own ? 'calibration' : 'nominal',
    };
    if (target.shifter === 'theta') {
      row.thetaRad = target.phaseRad;
      row.thetaVoltageV = drive.voltageV;
    } else {
      row.phiRad = target.phaseRad;
      row.phiVoltageV = drive.voltageV;
    }
    row.powerW += drive.powerW;
    row.currentA += drive.currentA;
    row.overLimit ||= drive.violations.length > 0;
    rows.set(target.gate, row);
  }
  return [...rows.values()];
}
