// Example: place a single-cell ring notch on an invented demo chip and read its response with @hexloom/solver.
import { buildMesh, DEMO_TECHNOLOGY, emptyConfiguration, MESH_SCHEMA_VERSION, placeCircuit, type Configuration, type MeshDefinition } from '@hexloom/mesh';
import { amplitudeDb, netlistFromMesh, simulateConnection } from '@hexloom/solver';

/** The demo chip (invented figures): a radius-2 block, 650 um units, n_g 4.2, 0.25 dB per gate, 25 dB extinction. */
export function demoRingConfiguration(): Configuration {
  const bare: MeshDefinition = {
    schemaVersion: MESH_SCHEMA_VERSION,
    name: 'demo ring notch',
    shape: { kind: 'hexagon', radius: 2 },
    technology: { ...DEMO_TECHNOLOGY, bendLossDb: 0, phaseShifter: { ...DEMO_TECHNOLOGY.phaseShifter, maxPowerW: 0.08, maxVoltageV: 12 } },
    ioSites: [],
    ports: [],
    deadGates: [],
  };
  const sites = buildMesh(bare).sites.filter((_, i) => i % 2 === 0).map((s) => s.vertex);
  const mesh = buildMesh({ ...bare, ioSites: sites });
  const [inPort, outPort] = [mesh.ports[0]!, mesh.ports[3]!];
  const definition: MeshDefinition = {
    ...mesh.definition,
    ports: [
      { id: inPort.id, wiredTo: 'fibre', label: 'in' },
      { id: outPort.id, wiredTo: 'detector', label: 'out' },
    ],
  };
  const placed = placeCircuit(emptyConfiguration(definition), { id: 'notch', kind: 'ring', from: 'in', to: 'out', perimeterUnits: 6, kappa: 0.1 });
  if (!placed.ok) throw new Error(`could not place the ring: ${placed.reason}`);
  return placed.configuration;
}

/** Simulates the demo ring from `in` to `out` over one unit FSR and returns the headline figures. */
export function runRingNotchExample(configuration: Configuration = demoRingConfiguration()) {
  const mesh = buildMesh(configuration.mesh);
  const chip = netlistFromMesh({ mesh, configuration });
  const from = chip.portIdOf.get('in')!, to = chip.portIdOf.get('out')!;
  const result = simulateConnection(chip.netlist, {
    from,
    to,
    grid: { kind: 'fsr', points: 4096 },
    unitDelayS: chip.unitDelayS,
    referenceFrequencyHz: chip.referenceFrequencyHz,
  });
  const db = amplitudeDb(result.spectrum);
  const deepest = db.indexOf(Math.min(...db));
  return {
    unitFsrHz: 1 / chip.unitDelayS,
    ringFsrHz: 1 / (6 * chip.unitDelayS),
    notchDepthDb: db[deepest]! - Math.max(...db),
    notchOffsetHz: result.spectrum.offsetsHz[deepest]!,
    groupDelayAtNotchPs: result.spectrum.groupDelayS[deepest]! * 1e12,
    impulseSteps: result.run.steps,
    residualEnergy: result.run.residualEnergy,
    delivered: result.powerBalance.chosen[to]!,
    leakedToOtherPorts: Object.values(result.powerBalance.leakage).reduce((a, b) => a + b, 0),
    lost: result.powerBalance.lost,
  };
}

if (process.argv[1]?.endsWith('ring-notch.ts')) {
  console.log(runRingNotchExample());
}
