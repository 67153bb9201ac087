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

describe('hexloom synth on the example specifications', () => {
  it('has an example for every specification kind', () => {
    const kinds = specs.map((f) => (JSON.parse(readFileSync(join(here, f), 'utf8')) as { spec: { kind: string } }).spec.kind).sort();
    expect(kinds).toEqual(['add-drop', 'allpass-equaliser', 'coupled-ring-bandpass', 'delay-line', 'mzi-lattice', 'ring-notch', 'transversal', 'ttd-set']);
  });

  for (const file of specs) {
    it(`realises ${file} and writes a configuration that passes the checker`, () => {
      const configuration = join(out, file.replace('.spec.json', '.configuration.json'));
      const report = join(out, file.replace('.spec.json', '.report.json'));
      const run = spawnSync(process.execPath, [bin, 'synth', join(here, file), '--chip', chip, '-o', configuration, '--report', report], { encoding: 'utf8' });
      expect(run.status, run.stderr).toBe(0);
      expect(run.stderr).toMatch(/placed /);
      const check = JSON.parse(execFileSync(process.execPath, [bin, 'check', configuration], { encoding: 'utf8' })) as { ok: boolean };
      expect(check.ok).toBe(true);
      const parsed = JSON.parse(readFileSync(report, 'utf8')) as { verification: { mask: { pass: boolean } }[] };
      expect(parsed.verification.every((v) => v.mask.pass)).toBe(true);
    });
  }

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
