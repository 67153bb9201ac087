/** The invented demo designs: a 12 x 8 mesh chip, its calibration, and three filter specifications. */
import type { FilterSpec, MeshDefinitionFile, ShifterCalibrationBody } from '@hexloom/contracts';
import { buildMesh, DEMO_TECHNOLOGY, makeMeshDefinition, type TechnologyProfile, vertexPosition } from '@hexloom/mesh';
import { randomStream } from '@hexloom/synth';

/** Invented figures of the demo scenario (one definition in libs/mesh): 650 um units, n_g 4.2, 0.25 dB per gate, 25 dB extinction, P_pi 22 mW, 1.2 kOhm. */
export const DEMO_CHIP_TECHNOLOGY: TechnologyProfile = DEMO_TECHNOLOGY;

/** Name of the demo chip (invented ground-terminal filter mesh). */
export const DEMO_CHIP_NAME = 'Kestrel Vale ground-terminal mesh (demo)';

/** The 12 x 8 demo chip with I/O on the west and east sides, ports labelled W01.. and E01.. from the top. */
export function demoChipDefinition(): MeshDefinitionFile {
  const bare = makeMeshDefinition({ name: DEMO_CHIP_NAME, shape: { kind: 'rectangle', rows: 8, columns: 12 }, technology: DEMO_CHIP_TECHNOLOGY, io: 'left-right' });
  const mesh = buildMesh(bare);
  const at = (id: string) => vertexPosition(id.split('/')[0] ?? '');
  const xs = bare.ports.map((p) => at(p.id).x);
  const mid = (Math.min(...xs) + Math.max(...xs)) / 2;
  const sorted = [...bare.ports].sort((a, b) => at(a.id).y - at(b.id).y || (a.id < b.id ? -1 : 1));
  let west = 0;
  let east = 0;
  const labels = new Map(sorted.map((p) => [p.id, at(p.id).x < mid ? `W${String(++west).padStart(2, '0')}` : `E${String(++east).padStart(2, '0')}`]));
  if (mesh.ports.length !== bare.ports.length) throw new Error('demoChipDefinition: port count changed');
  return { ...(bare as MeshDefinitionFile), ports: bare.ports.map((p) => ({ ...p, label: labels.get(p.id) })) };
}

/** An invented calibration: every shifter of every gate with small seeded spreads around the profile. */
export function demoCalibration(definition: MeshDefinitionFile): ShifterCalibrationBody[] {
  const random = randomStream(20_261_201, 0);
  const clamp = (x: number, lo: number, hi: number) => Math.min(hi, Math.max(lo, x));
  return buildMesh(definition).gates.flatMap((g) =>
    (['theta', 'phi'] as const).map((shifter) => ({
      gate: g.id,
      shifter,
      offsetRad: clamp(0.6 * random.normal(), -3, 3),
      piPowerW: 0.022 * (1 + clamp(0.03 * random.normal(), -0.1, 0.1)),
      resistanceOhm: 1200 * (1 + clamp(0.02 * random.normal(), -0.08, 0.08)),
      maxPowerW: 0.06,
      maxVoltageV: 9,
    })),
  );
}

/** The three demo specifications (invented requirements of an invented satellite ground terminal). */
export const DEMO_SPECS: readonly { configuration: string; circuitId: string; spec: FilterSpec }[] = [
  {
    configuration: 'Beam-steering delay set',
    circuitId: 'ttd',
    spec: {
      schemaVersion: 1,
      name: '4-element true-time-delay set, 37.5 ps steps (demo)',
      // Outputs of one parity from W20 (every path there is even), so whole-unit steps can follow 37.5 ps.
      spec: { kind: 'ttd-set', from: 'W20', outputs: ['E09', 'E13', 'E21', 'E25'], stepPs: 37.5, tolerancePs: 5, bandHz: { fromHz: -1e9, toHz: 1e9 }, maxDelayRipplePs: 10, maxImbalanceDb: 1 },
      mask: { regions: [] },
    },
  },
  {
    configuration: 'Interferer notch',
    circuitId: 'notch',
    spec: {
      schemaVersion: 1,
      name: 'Tunable notch at +3 GHz (demo)',
      spec: { kind: 'ring-notch', from: 'W03', to: 'E03', centreOffsetHz: 3e9, target: { notchDepthDb: 20, regime: 'under' }, ring: { free: true } },
      mask: { regions: [{ kind: 'stop', range: { fromHz: 2.98e9, toHz: 3.02e9 }, minRejectionDb: 15 }] },
    },
  },
  {
    configuration: 'Downlink channel band-pass',
    circuitId: 'bandpass',
    spec: {
      schemaVersion: 1,
      name: 'Downlink channel, 3rd-order Butterworth, 1.2 GHz at +2 GHz (demo)',
      spec: { kind: 'coupled-ring-bandpass', from: 'W11', to: 'E11', through: 'W14', response: 'butterworth', order: 3, bandwidthHz: 1.2e9, centreOffsetHz: 2e9 },
      mask: { regions: [{ kind: 'pass', range: { fromHz: 1.8e9, toHz: 2.2e9 }, maxRippleDb: 1.5 }, { kind: 'stop', range: { fromHz: 5e9, toHz: 7e9 }, minRejectionDb: 25 }] },
    },
  },
];
