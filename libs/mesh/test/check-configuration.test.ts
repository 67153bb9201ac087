import { describe, expect, it } from 'vitest';
import { buildMesh, checkConfiguration, emptyConfiguration, placeCircuit, type Configuration } from '../src/index.js';
import { demoMesh, sidePorts } from './fixtures.js';

const mesh = demoMesh();
const sides = sidePorts(mesh);
const west = sides.west.filter((_p, i) => i % 2 === 0);
const east = sides.east.filter((_p, i) => i % 2 === 0);

function placed(): Configuration {
  const r = placeCircuit(emptyConfiguration(mesh.definition), { kind: 'ring', id: 'notch', from: west[3]!, to: east[3]!, perimeterUnits: 6, kappa: 0.1 }, mesh);
  if (!r.ok) throw new Error(r.message);
  return r.configuration;
}
const codes = (cfg: Configuration, m = mesh) => checkConfiguration(m, cfg).violations.map((v) => v.code);

describe('checkConfiguration', () => {
  it('accepts what the router placed', () => {
    expect(checkConfiguration(mesh, placed())).toEqual({ ok: true, violations: [] });
  });

  it('lists a waveguide used twice and a port used twice, naming both circuits', () => {
    const cfg = placed();
    const copy = { ...cfg.circuits[0]!, id: 'copy' };
    const v = checkConfiguration(mesh, { ...cfg, circuits: [...cfg.circuits, copy] }).violations;
    expect(v.map((x) => x.code)).toEqual(expect.arrayContaining(['waveguide-used-twice', 'port-used-twice']));
    expect(v.find((x) => x.code === 'port-used-twice')!.circuits).toEqual(['notch', 'copy']);
  });

  it('lists a gate set to a state its circuit does not need', () => {
    const cfg = placed();
    const bar = cfg.gates.find((g) => g.state === 'bar')!;
    const gates = cfg.gates.map((g) => (g === bar ? { ...g, state: 'cross' as const } : g));
    const v = checkConfiguration(mesh, { ...cfg, gates }).violations;
    expect(v).toHaveLength(1);
    expect(v[0]).toMatchObject({ code: 'inconsistent-state', gates: [bar.gate], circuits: ['notch'] });
  });

  it('lists a gate that was parked although a circuit needs it, and a coupler with the wrong kappa', () => {
    const cfg = placed();
    const split = cfg.gates.find((g) => g.state === 'split')!;
    const cross = cfg.gates.find((g) => g.state === 'cross');
    const gates = cfg.gates.filter((g) => g !== cross).map((g) => (g === split ? { ...g, kappa: 0.5 } : g));
    const v = checkConfiguration(mesh, { ...cfg, gates }).violations;
    expect(v.filter((x) => x.code === 'inconsistent-state').map((x) => x.gates[0])).toEqual(expect.arrayContaining([split.gate, ...(cross ? [cross.gate] : [])]));
  });

  it('lists a dead gate in use once the mesh says it died', () => {
    const cfg = placed();
    const used = cfg.circuits[0]!.paths.find((p) => p.steps.length > 0)!.steps[0]!.gate;
    const dead = buildMesh({ ...mesh.definition, deadGates: [used] });
    expect(codes(cfg, dead)).toContain('dead-gate-used');
  });

  it('lists a circuit that no longer connects when a step is missing', () => {
    const cfg = placed();
    const c = cfg.circuits[0]!;
    const k = c.paths.findIndex((p) => p.steps.length >= 3);
    const broken = { ...c, paths: c.paths.map((p, i) => (i === k ? { ...p, steps: [...p.steps.slice(0, 1), ...p.steps.slice(2)] } : p)) };
    const v = checkConfiguration(mesh, { ...cfg, circuits: [broken] }).violations;
    expect(v.map((x) => x.code)).toContain('circuit-disconnected');
  });

  it('lists a stale setting, an unknown gate and a duplicate circuit id', () => {
    const cfg = placed();
    const extra: Configuration = {
      ...cfg,
      gates: [...cfg.gates, { gate: 'g(5,5)e', state: 'cross', circuit: 'notch' }, { gate: 'g(99,0)e', state: 'bar' }],
      circuits: [...cfg.circuits, { id: 'notch', kind: 'path', ports: [], paths: [], couplers: [] }],
    };
    expect(codes(extra)).toEqual(expect.arrayContaining(['stale-setting', 'unknown-id', 'duplicate-circuit']));
  });

  it('lists a split gate whose inputs and outputs are at the same end', () => {
    const cfg = placed();
    const c = cfg.circuits[0]!;
    const ring = c.paths.find((p) => p.role === 'ring')!;
    const flipped = { ...ring, to: 'gate' in ring.from ? ring.from : ring.to };
    const v = checkConfiguration(mesh, { ...cfg, circuits: [{ ...c, paths: c.paths.map((p) => (p === ring ? flipped : p)) }] }).violations;
    expect(v.map((x) => x.code)).toContain('coupler-misuse');
  });
});
