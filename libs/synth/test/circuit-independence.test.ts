// Placing, re-routing or removing a circuit never changes what the other circuits of the chip see.
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { checkConfiguration, gateNeeds, placeCircuit, removeCircuit, type Configuration, type Mesh, type RouteRequest } from '@hexloom/mesh';
import { impulseResponse, netlistFromMesh, outputPortIndex } from '@hexloom/solver';
import { synthesise, type SynthesisSuccess } from '../src/index.js';
import { demoChip, DEMO_TECHNOLOGY } from './demo-chip.js';

// Ideal couplers (300 dB extinction leaves 1e-15 of the field on the other waveguide): without leakage a circuit's
// light never leaves its own waveguides, so its response depends only on the gates it uses.
const ideal = demoChip({ ...DEMO_TECHNOLOGY, extinctionDb: 300 });
const { west, east } = ideal;

const ok = (r: ReturnType<typeof synthesise>): SynthesisSuccess => {
  if (!r.ok) throw new Error(`${r.reason}: ${r.message}`);
  return r;
};

/** Two tuned circuits to start from: a ring notch and a third-order coupled-ring band-pass. */
function tunedStart(mesh: Mesh, configuration: Configuration, ports: { west: string[]; east: string[] }): Configuration {
  const notch = ok(synthesise({ mesh, configuration, circuitId: 'notch', spec: { schemaVersion: 1, name: 'notch', spec: { kind: 'ring-notch', from: ports.west[2]!, to: ports.east[2]!, centreOffsetHz: 3e9, target: { notchDepthDb: 20, regime: 'under' }, ring: { free: true } }, mask: { regions: [] } } }));
  const bandpass = ok(
    synthesise({
      mesh,
      configuration: notch.configuration,
      circuitId: 'bandpass',
      spec: { schemaVersion: 1, name: 'band-pass', spec: { kind: 'coupled-ring-bandpass', from: ports.west[10]!, to: ports.east[10]!, through: ports.west[13]!, response: 'butterworth', order: 3, bandwidthHz: 1.2e9, centreOffsetHz: 2e9 }, mask: { regions: [] } },
    }),
  );
  return bandpass.configuration;
}

/** Impulse responses from each circuit's first port to its other ports (time domain: exact, no grid). */
function responses(mesh: Mesh, configuration: Configuration): Map<string, Float64Array[]> {
  const chip = netlistFromMesh({ mesh, configuration });
  const out = new Map<string, Float64Array[]>();
  for (const c of configuration.circuits) {
    const [input, ...outputs] = c.ports;
    const ir = impulseResponse(chip.netlist, input!, { energyTolerance: 1e-28 });
    out.set(
      c.id,
      outputs.flatMap((p) => {
        const h = ir.outputs[outputPortIndex(chip.netlist, p)]!;
        return [h.re, h.im];
      }),
    );
  }
  return out;
}

const largestDifference = (a: Float64Array[], b: Float64Array[]): number => {
  let worst = a.length === b.length ? 0 : Infinity;
  a.forEach((x, k) => {
    const y = b[k]!;
    for (let n = 0; n < Math.max(x.length, y.length); n++) worst = Math.max(worst, Math.abs((x[n] ?? 0) - (y[n] ?? 0)));
  });
  return worst;
};

/** The setting every other circuit needs of every gate, as the configuration holds it. */
const heldNeeds = (mesh: Mesh, configuration: Configuration, except: string): Map<string, string> => {
  const settings = new Map(configuration.gates.map((g) => [g.gate, g]));
  const out = new Map<string, string>();
  for (const need of gateNeeds(mesh, configuration.circuits.filter((c) => c.id !== except)).needs.values()) {
    const id = mesh.gates[need.gate]!.id;
    const s = settings.get(id);
    out.set(id, JSON.stringify({ state: s?.state, kappa: s?.kappa, phase: need.phaseRad === undefined ? null : s?.phaseRad }));
  }
  return out;
};

type Op = { kind: 'delay-line' | 'ring' | 'path' | 'mzi'; from: number; to: number; size: number } | { kind: 'remove'; which: number };

const opArbitrary: fc.Arbitrary<Op> = fc.oneof(
  fc.record({ kind: fc.constantFrom('delay-line' as const, 'ring' as const, 'path' as const, 'mzi' as const), from: fc.nat({ max: 1000 }), to: fc.nat({ max: 1000 }), size: fc.nat({ max: 6 }) }),
  fc.record({ kind: fc.constant('remove' as const), which: fc.nat({ max: 10 }) }),
);

/** A route request on ports the configuration leaves free, or null when the op names none. */
function requestOf(op: Exclude<Op, { kind: 'remove' }>, configuration: Configuration, n: number): RouteRequest | null {
  const taken = new Set(configuration.circuits.flatMap((c) => c.ports));
  const freeWest = west.filter((p) => !taken.has(p));
  const freeEast = east.filter((p) => !taken.has(p));
  if (freeWest.length === 0 || freeEast.length === 0) return null;
  const from = freeWest[op.from % freeWest.length]!;
  const to = freeEast[op.to % freeEast.length]!;
  const id = `${op.kind}-${n}`;
  switch (op.kind) {
    case 'path':
      return { kind: 'path', id, from, to };
    case 'delay-line':
      return { kind: 'delay-line', id, from, to, lengthUnits: 30 + 2 * op.size + (op.from % 2), budget: 20_000 };
    case 'ring':
      return { kind: 'ring', id, from, to, perimeterUnits: op.size % 2 === 0 ? 6 : 10, kappa: 0.1 + 0.1 * op.size, phaseRad: 0.3 * op.size, budget: 20_000 };
    case 'mzi':
      return { kind: 'mzi', id, from, to, lengthDifferenceUnits: 2 + 2 * (op.size % 3), budget: 20_000 };
  }
}

describe('circuits never disturb each other', () => {
  const start = tunedStart(ideal.mesh, ideal.configuration, ideal);
  const startResponses = responses(ideal.mesh, start);
  let sharedPlacements = 0;
  let placements = 0;

  it('random sequences of place and remove leave every other circuit\'s impulse response unchanged to 1e-12', () => {
    fc.assert(
      fc.property(fc.array(opArbitrary, { minLength: 1, maxLength: 5 }), (ops) => {
        let configuration = start;
        let before = startResponses;
        ops.forEach((op, n) => {
          let next: Configuration;
          let changed: string;
          if (op.kind === 'remove') {
            if (configuration.circuits.length === 0) return;
            changed = configuration.circuits[op.which % configuration.circuits.length]!.id;
            next = removeCircuit(configuration, changed, ideal.mesh);
          } else {
            const request = requestOf(op, configuration, n);
            if (!request) return;
            const placed = placeCircuit(configuration, request, ideal.mesh);
            if (!placed.ok) return;
            placements += 1;
            const others = gateNeeds(ideal.mesh, configuration.circuits).needs;
            if ([...gateNeeds(ideal.mesh, [placed.circuit]).needs.keys()].some((g) => others.has(g))) sharedPlacements += 1;
            changed = placed.circuit.id;
            next = placed.configuration;
          }
          expect(checkConfiguration(ideal.mesh, next).violations).toEqual([]);
          expect(heldNeeds(ideal.mesh, next, changed)).toEqual(heldNeeds(ideal.mesh, configuration, changed));
          const after = responses(ideal.mesh, next);
          for (const [id, h] of before) {
            if (id === changed || !after.has(id)) continue;
            expect(largestDifference(h, after.get(id)!), `circuit ${id} after ${op.kind} ${changed}`).toBeLessThan(1e-12);
          }
          configuration = next;
          before = after;
        });
      }),
      { numRuns: 40, seed: 20_261_203 },
    );
  }, 60_000);

  it('really shared gates between circuits during those sequences', () => {
    // Without sharing the property above would hold trivially; the router shares the other waveguide of a gate
    // when a route needs it.
    expect(placements).toBeGreaterThan(25);
    expect(sharedPlacements).toBeGreaterThan(10);
  });
});

describe('a delay line through the other waveguide of a tuned ring gate', () => {
  const start = tunedStart(ideal.mesh, ideal.configuration, ideal);
  const notch = start.circuits.find((c) => c.id === 'notch')!;
  const tuner = notch.phases?.[0]?.gate;
  // Find a delay line the router draws through the tuner gate's other waveguide (deterministic search).
  const sharing = (() => {
    for (const from of west.slice(0, 8))
      for (const to of east.slice(0, 8))
        for (const lengthUnits of [22, 24, 26, 28, 30, 32, 34, 23, 25, 27, 29, 31, 33]) {
          const placed = placeCircuit(start, { kind: 'delay-line', id: 'delay', from, to, lengthUnits, budget: 20_000 }, ideal.mesh);
          if (placed.ok && placed.circuit.paths.some((p) => p.steps.some((s) => s.gate === tuner))) return placed;
        }
    return null;
  })();

  it('exists on the demo chip (the case that used to detune the ring)', () => {
    expect(tuner).toBeDefined();
    expect(sharing).not.toBeNull();
  });

  it('keeps the ring\'s tuning phase, and removing it again restores the configuration exactly', () => {
    if (!sharing || !tuner) throw new Error('no sharing delay line');
    const phaseOf = (c: Configuration) => c.gates.find((g) => g.gate === tuner)?.phaseRad;
    expect(phaseOf(sharing.configuration)).toBe(phaseOf(start));
    expect(checkConfiguration(ideal.mesh, sharing.configuration).ok).toBe(true);
    const removed = removeCircuit(sharing.configuration, 'delay', ideal.mesh);
    const key = (c: Configuration) => [...c.gates].sort((a, b) => (a.gate < b.gate ? -1 : 1));
    expect(key(removed)).toEqual(key(start));
    const r0 = responses(ideal.mesh, start);
    const r1 = responses(ideal.mesh, sharing.configuration);
    for (const id of ['notch', 'bandpass']) expect(largestDifference(r0.get(id)!, r1.get(id)!)).toBeLessThan(1e-12);
  });

  it('is reported by the checker when the shared gate loses the ring\'s phase', () => {
    if (!sharing || !tuner) throw new Error('no sharing delay line');
    const broken = { ...sharing.configuration, gates: sharing.configuration.gates.map((g) => (g.gate === tuner ? { ...g, phaseRad: 0, circuit: 'delay' } : g)) };
    const check = checkConfiguration(ideal.mesh, broken);
    expect(check.ok).toBe(false);
    expect(check.violations.map((v) => v.code)).toContain('shared-gate-conflict');
    expect(check.violations.find((v) => v.code === 'shared-gate-conflict')?.gates).toEqual([tuner]);
  });
});
