// Runs `hexloom synth` on every example specification against the demo chip, as a user would.
import { execFileSync, spawnSync } from 'node:child_process';
import { mkdtempSync, readFileSync, readdirSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { fileURLToPath } from 'node:url';
import { describe, expect, it, vi } from 'vitest';

// Each run starts a fresh CLI process that compiles the TypeScript sources through tsx: seconds, not milliseconds.
vi.setConfig({ testTimeout: 60_000 });

const here = fileURLToPath(new URL('.', import.meta.url));
const bin = fileURLToPath(new URL('../../apps/cli/bin/hexloom.js', import.meta.url));
const chip = join(here, 'demo-chip.mesh.json');
const out = mkdtempSync(join(tmpdir(), 'hexloom-synth-'));
const specs = readdirSync(here).filter((f) => f.endsWith('.spec.json'));

/** What each example is expected to give: a placed circuit whose every check passes, or a clear refusal. */
const EXPECTED: Record<string, 'pass' | 'refused'> = {
  'add-drop.spec.json': 'pass',
  'allpass-equaliser.spec.json': 'pass',
  'coupled-ring-bandpass.spec.json': 'pass',
  'delay-line.spec.json': 'pass',
  'mzi-lattice.spec.json': 'pass',
  'ring-notch.spec.json': 'pass',
  'transversal.spec.json': 'pass',
  'ttd-set.spec.json': 'pass',
  'ttd-set-mixed-parity.spec.json': 'refused',
};
type Report = { verdict: { pass: boolean; checkCount: number }; verification: { toName: string; role: string; mask: { pass: boolean; checks: { kind: string }[] }; figures: Record<string, number> }[] };

describe('hexloom synth on the example specifications', () => {
  it('has an example for every specification kind', () => {
    const kinds = [...new Set(specs.map((f) => (JSON.parse(readFileSync(join(here, f), 'utf8')) as { spec: { kind: string } }).spec.kind))].sort();
    expect(kinds).toEqual(['add-drop', 'allpass-equaliser', 'coupled-ring-bandpass', 'delay-line', 'mzi-lattice', 'ring-notch', 'transversal', 'ttd-set']);
    expect(specs.sort()).toEqual(Object.keys(EXPECTED).sort());
  });

  for (const file of specs.filter((f) => EXPECTED[f] === 'pass')) {
    it(`realises ${file}, meets every mask and target check on every output, and writes a configuration that passes the checker`, () => {
      const configuration = join(out, file.replace('.spec.json', '.configuration.json'));
      const report = join(out, file.replace('.spec.json', '.report.json'));
      const run = spawnSync(process.execPath, [bin, 'synth', join(here, file), '--chip', chip, '-o', configuration, '--report', report], { encoding: 'utf8' });
      expect(run.status, run.stderr).toBe(0);
      expect(run.stderr).toMatch(/placed /);
      expect(run.stderr).toMatch(/verdict: pass/);
      const check = JSON.parse(execFileSync(process.execPath, [bin, 'check', configuration], { encoding: 'utf8' })) as { ok: boolean };
      expect(check.ok).toBe(true);
      const parsed = JSON.parse(readFileSync(report, 'utf8')) as Report;
      // Never a vacuous pass: every main output carries at least one check derived from the spec's own targets.
      for (const v of parsed.verification.filter((x) => x.role === 'main')) expect(v.mask.checks.some((c) => c.kind === 'target'), v.toName).toBe(true);
      expect(parsed.verdict.checkCount).toBeGreaterThan(0);
      expect(parsed.verdict.pass).toBe(true);
      expect(parsed.verification.every((v) => v.mask.pass)).toBe(true);
    });
  }

  it('realises the demo delay set with per-output delays within one unit delay of base + k x 37.5 ps', () => {
    const report = join(out, 'ttd-set.report.json');
    const parsed = JSON.parse(readFileSync(report, 'utf8')) as Report & { basePs: number };
    const unitDelayPs = (4.2 * 650e-6 * 1e12) / 299_792_458; // T_u = n_g L_u / c (common practice): 9.106 ps
    expect(parsed.verification.map((v) => v.toName)).toEqual(['E09', 'E13', 'E21', 'E25']);
    parsed.verification.forEach((v, k) => {
      expect(Math.abs((v.figures.delayAtCarrierPs as number) - (parsed.basePs + 37.5 * k))).toBeLessThan(unitDelayPs);
      if (k > 0) expect(Math.abs(v.figures.stepErrorPs as number)).toBeLessThan(unitDelayPs);
    });
  });

  it('refuses a delay set on outputs of both parities with exit code 2, the nearest realisable set and ports of the right parity', () => {
    const run = spawnSync(process.execPath, [bin, 'synth', join(here, 'ttd-set-mixed-parity.spec.json'), '--chip', chip], { encoding: 'utf8' });
    expect(run.status).toBe(2);
    const answer = JSON.parse(run.stdout) as { ok: boolean; reason: string; message: string; notes: { quantity: string }[] };
    expect(answer).toMatchObject({ ok: false, reason: 'delay-set-unrealisable' });
    expect(answer.message).toMatch(/nearest realisable set/);
    expect(answer.message).toMatch(/E15 -> E1[34]/);
    expect(answer.notes.filter((n) => n.quantity.startsWith('nearest realisable delay'))).toHaveLength(4);
  });

  it('answers an impossible specification with exit code 2 and the reason as JSON', () => {
    const spec = join(out, 'too-narrow.spec.json');
    writeFileSync(spec, JSON.stringify({ schemaVersion: 1, name: 'too narrow', spec: { kind: 'ring-notch', from: 'W03', to: 'E03', centreOffsetHz: 0, target: { fwhmHz: 1e6 }, ring: { free: true } } }));
    const run = spawnSync(process.execPath, [bin, 'synth', spec, '--chip', chip], { encoding: 'utf8' });
    expect(run.status).toBe(2);
    expect(JSON.parse(run.stdout)).toMatchObject({ ok: false, reason: 'impossible-design' });
    expect(run.stderr).toMatch(/narrower than the loss allows/);
  });

  it('reports a malformed specification with the field named', () => {
    const spec = join(out, 'bad.spec.json');
    writeFileSync(spec, JSON.stringify({ schemaVersion: 1, name: 'bad', spec: { kind: 'mzi-lattice', from: 'W03', to: 'E03', band: 'half-band', order: 4, armDifferenceUnits: 3 } }));
    const run = spawnSync(process.execPath, [bin, 'synth', spec, '--chip', chip], { encoding: 'utf8' });
    expect(run.status).toBe(1);
    expect(run.stderr).toMatch(/armDifferenceUnits/);
  });
});
