// hexloom check on a gate shared by two circuits: agreed needs pass, a lost tuning phase is reported.
import { spawnSync } from 'node:child_process';
import { mkdtempSync, readFileSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { fileURLToPath } from 'node:url';
import { describe, expect, it } from 'vitest';
import { buildMesh, emptyConfiguration, placeCircuit, type Configuration, type MeshDefinition } from '@hexloom/mesh';
import { synthesise } from '@hexloom/synth';

const repoRoot = fileURLToPath(new URL('../../../', import.meta.url));
const bin = join(repoRoot, 'apps/cli/bin/hexloom.js');
const dir = mkdtempSync(join(tmpdir(), 'hexloom-cli-shared-'));
const definition = JSON.parse(readFileSync(join(repoRoot, 'examples/synth/demo-chip.mesh.json'), 'utf8')) as MeshDefinition;
const mesh = buildMesh(definition);

/** A notch, then a delay line the router draws through the other waveguide of the notch's tuning gate. */
function sharedConfiguration(): { configuration: Configuration; tuner: string } {
  const notch = synthesise({ mesh, configuration: emptyConfiguration(definition), circuitId: 'notch', spec: { schemaVersion: 1, name: 'notch', spec: { kind: 'ring-notch', from: 'W03', to: 'E03', centreOffsetHz: 3e9, target: { notchDepthDb: 20, regime: 'under' }, ring: { free: true } }, mask: { regions: [] } } });
  if (!notch.ok) throw new Error(notch.message);
  const tuner = notch.circuit.phases?.[0]?.gate as string;
  for (const from of ['W01', 'W02', 'W04', 'W05', 'W06'])
    for (const to of ['E01', 'E02', 'E04', 'E05', 'E06'])
      for (const lengthUnits of [22, 23, 24, 25, 26, 27, 28, 29, 30]) {
        const placed = placeCircuit(notch.configuration, { kind: 'delay-line', id: 'delay', from, to, lengthUnits, budget: 20_000 }, mesh);
        if (placed.ok && placed.circuit.paths.some((p) => p.steps.some((s) => s.gate === tuner))) return { configuration: placed.configuration, tuner };
      }
  throw new Error('no delay line shares the tuning gate');
}

describe('hexloom check on a shared gate', () => {
  const { configuration, tuner } = sharedConfiguration();

  it('passes when both circuits get what they need of the shared gate', () => {
    const file = join(dir, 'shared.json');
    writeFileSync(file, JSON.stringify(configuration));
    const run = spawnSync(process.execPath, [bin, 'check', file], { encoding: 'utf8' });
    expect(run.status, run.stdout).toBe(0);
  }, 60_000);

  it('reports a conflicting shared gate with exit code 3 when the ring lost its phase to the other circuit', () => {
    const broken = { ...configuration, gates: configuration.gates.map((g) => (g.gate === tuner ? { ...g, phaseRad: 0, circuit: 'delay' } : g)) };
    const file = join(dir, 'broken.json');
    writeFileSync(file, JSON.stringify(broken));
    const run = spawnSync(process.execPath, [bin, 'check', file, '--text'], { encoding: 'utf8' });
    expect(run.status).toBe(3);
    expect(run.stdout).toMatch(new RegExp(`shared-gate-conflict: gate ${tuner.replace(/[()]/g, '\\$&')} \\(shared by notch and delay\\) has outer phase 0 rad but circuit notch needs`));
  }, 60_000);
});
