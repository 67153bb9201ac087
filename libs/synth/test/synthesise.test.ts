import { describe, expect, it } from 'vitest';
import { AXIAL_OFFSETS, checkConfiguration, parseGateId } from '@hexloom/mesh';
import { unitDelayS } from '@hexloom/solver';
import { synthesise, type SynthesisSuccess } from '../src/index.js';
import { demoChip, DEMO_TECHNOLOGY } from './demo-chip.js';

const T_U = unitDelayS({ unitLengthUm: 650, groupIndex: 4.2 });
const chip = demoChip();
const { west, east } = chip;

const ok = (r: ReturnType<typeof synthesise>): SynthesisSuccess => {
  if (!r.ok) throw new Error(`${r.reason}: ${r.message}`);
  return r;
};

describe('synthesise a ring notch on the demo chip', () => {
  const result = ok(
    synthesise({
      mesh: chip.mesh,
      configuration: chip.configuration,
      circuitId: 'notch',
      spec: { schemaVersion: 1, name: 'notch', spec: { kind: 'ring-notch', from: west[2] as string, to: east[2] as string, centreOffsetHz: 3e9, target: { notchDepthDb: 20, regime: 'under' }, ring: { free: true } }, mask: { regions: [] } },
    }),
  );
  const v = result.verification[0]!;

  it('places a valid circuit with the FSR of a six-unit ring', () => {
    expect(checkConfiguration(chip.mesh, result.configuration)).toEqual({ ok: true, violations: [] });
    // FSR = 1 / (6 T_u) for a single-cell ring (ring FSR, common practice).
    expect(result.fsrHz).toBeCloseTo(1 / (6 * T_U), -3);
  });

  it('puts the notch at the requested centre (phase tuning)', () => {
    let min = 0;
    v.response.powerDb.forEach((p, i) => { if (p < (v.response.powerDb[min] as number)) min = i; });
    // Resonances repeat every FSR = 1 / (6 T_u) (ring FSR, common practice); the grid step is FSR / 800.
    expect(Math.abs((v.response.frequencyHz[min] as number) - 3e9)).toBeLessThan(1 / (6 * T_U) / 400);
  });

  it('has the designed width and the resonant delay of the ring equations, negative when under-coupled', () => {
    if (result.design.kind !== 'ring-notch') throw new Error('wrong kind');
    const ring = result.design.ring;
    const p = v.response.powerDb;
    let min = 0;
    p.forEach((x, i) => { if (x < (p[min] as number)) min = i; });
    // Width at half depth in linear power (Rabus 2007, ch. 2), interpolated on the simulated curve.
    const lin = p.map((x) => 10 ** (x / 10));
    const half = (Math.max(...lin) + (lin[min] as number)) / 2;
    let lo = min;
    while (lo > 0 && (lin[lo] as number) < half) lo--;
    let hi = min;
    while (hi < lin.length - 1 && (lin[hi] as number) < half) hi++;
    const width = (v.response.frequencyHz[hi] as number) - (v.response.frequencyHz[lo] as number);
    expect(Math.abs(width - ring.fwhmHz) / ring.fwhmHz).toBeLessThan(0.1);
    // Resonant delay a(1 - r^2) / ((a - r)(1 - ar)) round trips (from the phase of Yariv 2000's transmission),
    // on top of the bus delay: bus path steps plus the coupler traversal, one unit each.
    const busUnits = result.circuit.paths.filter((path) => path.role === 'bus').reduce((n, path) => n + path.steps.length, 0) + 1;
    const ringDelayRoundTrips = ((v.response.groupDelayPs[min] as number) * 1e-12 - busUnits * T_U) / (6 * T_U);
    expect(ringDelayRoundTrips).toBeLessThan(0);
    expect(Math.abs(ringDelayRoundTrips - ring.delayAtResonanceRoundTrips) / Math.abs(ring.delayAtResonanceRoundTrips)).toBeLessThan(0.15);
  });

  it('reaches the designed notch depth within 2 dB on the whole-chip model', () => {
    // Ring equations: depth (r - a)^2 / (1 - ar)^2 (Rabus 2007, ch. 2). The whole chip adds leakage through idle
    // gates and finite extinction of the ring's own gates, hence the 2 dB allowance.
    const depth = Math.max(...v.response.powerDb) - Math.min(...v.response.powerDb);
    expect(Math.abs(depth - 20)).toBeLessThan(2);
  });
});

describe('synthesise a coupled-ring band-pass', () => {
  // The design rules are checked on a low-loss variant of the demo technology (0.01 dB per gate, 50 dB extinction),
  // where dissipation does not round the pass band; the demo chip itself is checked for a usable band.
  const lowLoss = demoChip({ ...DEMO_TECHNOLOGY, lossPerGateDb: 0.01, bendLossDb: 0, extinctionDb: 50 });
  const band = (c: ReturnType<typeof demoChip>, response: 'butterworth' | 'chebyshev', rippleDb?: number) =>
    ok(
      synthesise({
        mesh: c.mesh,
        configuration: c.configuration,
        circuitId: 'bp',
        spec: { schemaVersion: 1, name: 'bp', spec: { kind: 'coupled-ring-bandpass', from: c.west[6] as string, to: c.east[6] as string, through: c.west[9] as string, response, order: 3, bandwidthHz: 1.2e9, centreOffsetHz: 2e9, ...(rippleDb ? { rippleDb } : {}) }, mask: { regions: [] } },
      }),
    );

  it('gives a third-order Butterworth its 3 dB points at the band edges, maximally flat', () => {
    const v = band(lowLoss, 'butterworth').verification[0]!;
    // Butterworth: |H|^2 = 1/2 at the band edges and maximally flat at the centre (Matthaei, Young & Jones 1964,
    // sec. 4.03). Narrow-band coupled-mode design (Little et al. 1997): edges within 3 % of the width.
    expect(Math.abs((v.figures.bandwidthHz as number) - 1.2e9)).toBeLessThan(0.036e9);
    expect(Math.abs(((v.figures.bandLowHz as number) + (v.figures.bandHighHz as number)) / 2 - 2e9)).toBeLessThan(0.02e9);
    const nearCentre = v.response.frequencyHz.flatMap((f, i) => (Math.abs(f - 2e9) < 0.2e9 ? [v.response.powerDb[i] as number] : []));
    // Third order maximally flat: at a third of the half-width the drop is 10 log10(1 + (1/3)^6) = 0.006 dB.
    expect(Math.max(...nearCentre) - Math.min(...nearCentre)).toBeLessThan(0.05);
  });

  it('keeps a 0.5 dB Chebyshev within its ripple in band', () => {
    const v = band(lowLoss, 'chebyshev', 0.5).verification[0]!;
    const inBand = v.response.frequencyHz.flatMap((f, i) => (Math.abs(f - 2e9) < 0.55e9 ? [v.response.powerDb[i] as number] : []));
    const ripple = Math.max(...inBand) - Math.min(...inBand);
    // Chebyshev: equal ripple of L_Ar = 0.5 dB across the ripple band (Matthaei, Young & Jones 1964, sec. 4.03);
    // allowance 0.15 dB for the narrow-band approximation and the residual loss.
    expect(Math.abs(ripple - 0.5)).toBeLessThan(0.15);
  });

  it('still passes a usable band on the lossy demo chip', () => {
    const v = band(chip, 'butterworth').verification[0]!;
    expect(Math.abs((v.figures.bandwidthHz as number) - 1.2e9)).toBeLessThan(0.15e9);
    // Rejection figure: pass-band peak over the highest power two band widths or more from the centre. A third-order
    // Butterworth gives 10 log10(1 + 4^6) = 36 dB there (closed form); dissipation on the lossy chip fills it to ~22 dB.
    expect(v.figures.rejectionDb).toBeGreaterThan(20);
  });
});

describe('synthesise a delay line', () => {
  it('realises a delay in whole units of the right parity and reports the rounding', () => {
    const result = ok(
      synthesise({
        mesh: chip.mesh,
        configuration: chip.configuration,
        circuitId: 'dl',
        spec: { schemaVersion: 1, name: 'dl', spec: { kind: 'delay-line', from: west[1] as string, to: east[1] as string, delay: { ps: 400 }, tolerancePs: 10 }, mask: { regions: [] } },
      }),
    );
    const v = result.verification[0]!;
    const units = result.circuit.paths[0]!.steps.length;
    expect(Math.abs(units * T_U - 400e-12)).toBeLessThan(10e-12);
    // Group delay of a path of L units is L T_u (common practice). Leakage through the parked gates (25 dB
    // extinction) ripples it; its mean over the grid stays within 1 %.
    const mean = v.response.groupDelayPs.reduce((s, d) => s + d, 0) / v.response.groupDelayPs.length;
    expect(Math.abs(mean * 1e-12 - units * T_U) / (units * T_U)).toBeLessThan(0.01);
  });

  it('has exactly the delay L T_u on a chip whose gates do not leak', () => {
    const clean = demoChip({ ...DEMO_TECHNOLOGY, extinctionDb: 200 });
    const result = ok(synthesise({ mesh: clean.mesh, configuration: clean.configuration, circuitId: 'dl', spec: { schemaVersion: 1, name: 'dl', spec: { kind: 'delay-line', from: clean.west[1] as string, to: clean.east[1] as string, delay: { ps: 400 }, tolerancePs: 10 }, mask: { regions: [] } } }));
    const units = result.circuit.paths[0]!.steps.length;
    // With no leakage the chip is a pure delay z^-L: group delay L T_u at every frequency (common practice).
    for (const d of result.verification[0]!.response.groupDelayPs) expect(d * 1e-12).toBeCloseTo(units * T_U, 15);
  });
});

describe('impossible requests', () => {
  it('answer a band narrower than the loss allows with a reason, not an exception', () => {
    const r = synthesise({
      mesh: chip.mesh,
      configuration: chip.configuration,
      circuitId: 'n',
      spec: { schemaVersion: 1, name: 'n', spec: { kind: 'ring-notch', from: west[2] as string, to: east[2] as string, centreOffsetHz: 0, target: { fwhmHz: 1e6 }, ring: { free: true } }, mask: { regions: [] } },
    });
    expect(r.ok).toBe(false);
    if (!r.ok) expect(r.reason).toBe('impossible-design');
  });
  it('answer a taken port with the router reason', () => {
    const first = ok(synthesise({ mesh: chip.mesh, configuration: chip.configuration, circuitId: 'a', spec: { schemaVersion: 1, name: 'a', spec: { kind: 'delay-line', from: west[1] as string, to: east[1] as string, delay: { units: 25 }, tolerancePs: 0 }, mask: { regions: [] } } }));
    const second = synthesise({ mesh: chip.mesh, configuration: first.configuration, circuitId: 'b', spec: { schemaVersion: 1, name: 'b', spec: { kind: 'delay-line', from: west[1] as string, to: east[3] as string, delay: { units: 25 }, tolerancePs: 0 }, mask: { regions: [] } } });
    expect(second.ok).toBe(false);
    if (!second.ok) expect(second.reason).toBe('port-taken');
    void DEMO_TECHNOLOGY;
  });
});

describe('placement inside a region', () => {
  it('keeps every gate of the circuit on a cell of the region', () => {
    const region = chip.mesh.cells.filter((c) => c.r <= 3).map((c) => c.id);
    const inRegion = new Set(region);
    const result = ok(
      synthesise({
        mesh: chip.mesh,
        configuration: chip.configuration,
        circuitId: 'notch',
        spec: { schemaVersion: 1, name: 'notch', spec: { kind: 'ring-notch', from: west[2] as string, to: east[2] as string, centreOffsetHz: 0, target: { notchDepthDb: 15, regime: 'under' }, ring: { free: true }, region }, mask: { regions: [] } },
      }),
    );
    const cellsOfGate = (id: string): string[] => {
      const g = parseGateId(id);
      const o = AXIAL_OFFSETS[g.direction] as { q: number; r: number };
      return [`c(${g.cell.q},${g.cell.r})`, `c(${g.cell.q + o.q},${g.cell.r + o.r})`];
    };
    const gates = result.circuit.paths.flatMap((p) => p.steps.map((s) => s.gate)).concat(result.circuit.couplers.map((c) => c.gate));
    for (const gate of gates) expect(cellsOfGate(gate).some((c) => inRegion.has(c)), gate).toBe(true);
  });
});
