// Invented fixtures for the bench and measured panels: a two-port version of the demo chip and bench exports.
import { canonicalJson, sha256Hex } from '@hexloom/bench';
import type { BenchExportBody, ConfigurationVersion } from '@hexloom/contracts';
import { demoVersion } from '../../../test/demoChip.js';

export const PORT_IN = 'v(0,0)n/g(0,0)ne';
export const PORT_OUT = 'v(1,0)n/g(1,0)ne';

/** Version 2 of the demo configuration, on a chip whose two ports are labelled W01 and E01. */
export const benchVersion: ConfigurationVersion = {
  ...demoVersion,
  content: {
    ...demoVersion.content,
    mesh: {
      ...demoVersion.content.mesh,
      ports: [
        { id: PORT_IN, wiredTo: 'fibre', label: 'W01' },
        { id: PORT_OUT, wiredTo: 'fibre', label: 'E01' },
      ],
    },
  },
};

/** A heater of 1.2 kOhm (the demo figure) driven at `voltageV`: P = V^2 / R and I = V / R (Ohm's law, common practice). */
export const heaterDrive = (gate: string, shifter: 'theta' | 'phi', voltageV: number, targetPhaseRad: number): BenchExportBody['drives'][number] => ({
  gate,
  shifter,
  targetPhaseRad,
  voltageV,
  currentA: voltageV / 1200,
  powerW: (voltageV * voltageV) / 1200,
  source: 'calibration',
});

/** Three drives: 3 V, 2.4 V and 1.2 V on 1.2 kOhm are 7.5 mW, 4.8 mW and 1.2 mW (P = V^2 / R, common practice). */
export const demoDrives = [heaterDrive('g(0,0)ne', 'theta', 3, 1.2), heaterDrive('g(0,0)ne', 'phi', 2.4, 0.77), heaterDrive('g(1,0)e', 'theta', 1.2, 0.123)];

/** An export body with a checksum computed by libs/bench over every other field; `overrides` change fields before hashing. */
export async function signedExport(overrides: Partial<Omit<BenchExportBody, 'checksum'>> = {}): Promise<BenchExportBody> {
  const body: Omit<BenchExportBody, 'checksum'> = {
    schemaVersion: 1,
    kind: 'hexloom-bench-export',
    chip: 'Demo mesh (invented)',
    configuration: 'Interferer notch',
    version: 2,
    approved: false,
    approval: 'not approved',
    cautions: ['Check every drive value against the ratings (test caution one).', 'Follow the laser safety rules of the lab (test caution two).'],
    parkedState: 'bar',
    gates: [
      { gate: 'g(0,0)ne', state: 'split', kappa: 0.25, phaseRad: 0.77, circuit: 'notch' },
      { gate: 'g(1,0)e', state: 'cross', circuit: 'notch' },
    ],
    drives: demoDrives,
    totalPowerW: demoDrives.reduce((s, d) => s + d.powerW, 0),
    ...overrides,
  };
  return { ...body, checksum: await sha256Hex(canonicalJson(body)) };
}
