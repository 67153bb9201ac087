// `hexloom simulate` and `hexloom sparams` on the example configuration, read back by the solver's own readers.
import { execFileSync, spawnSync } from 'node:child_process';
import { mkdtempSync, readFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { fileURLToPath } from 'node:url';
import { describe, expect, it } from 'vitest';
import { sParametersFileSchema, spectrumFileSchema } from '@hexloom/contracts';
import { readSpectrumCsv, readTouchstone } from '@hexloom/solver';

const repoRoot = fileURLToPath(new URL('../../../', import.meta.url));
const CONFIG = 'examples/solver/ring-notch.configuration.json';
const run = (...args: string[]): string => execFileSync('npx', ['--no-install', 'hexloom', ...args], { cwd: repoRoot, encoding: 'utf8', maxBuffer: 64 << 20 });

describe('hexloom simulate', () => {
  it('prints a spectrum CSV over one unit FSR from port "in" to port "out"', () => {
    const csv = run('simulate', CONFIG, '--from', 'in', '--to', 'out', '--points', '256');
    const s = readSpectrumCsv(csv);
    expect(s.frequenciesHz.length).toBe(256);
    // Grid spacing = unit FSR / points, with T_u = n_g L_u / c = 9.1063 ps (common practice).
    expect((s.frequenciesHz[1]! - s.frequenciesHz[0]!) * 256 * 9.1063e-12).toBeCloseTo(1, 4);
    expect(s.groupDelayS).not.toBeNull();
  }, 60_000);

  it('prints the JSON spectrum file of a narrow span by direct sum', () => {
    const file = spectrumFileSchema.parse(JSON.parse(run('simulate', CONFIG, '--from', 'in', '--to', 'out', '--span', '-2:2', '--points', '41', '--format', 'json')));
    expect(file.method).toBe('direct-sum');
    expect(file.points.offsetHz[0]).toBeCloseTo(-2e9, 0);
    expect(file.points.offsetHz.at(-1)).toBeCloseTo(2e9, 0);
    expect(file.run.converged).toBe(true);
  }, 60_000);

  it('prints a two-port Touchstone file that the reader takes back', () => {
    const t = readTouchstone(run('simulate', CONFIG, '--from', 'in', '--to', 'out', '--points', '64', '--format', 's2p'), { fileName: 'ring.s2p' });
    expect(t.portCount).toBe(2);
    expect(t.frequenciesHz.length).toBe(64);
    // Reciprocity S21 = S12 (Pozar, Microwave Engineering, sec. 4.3).
    expect(t.re[2]!).toBeCloseTo(t.re[1]!, 9);
  }, 60_000);

  it('writes the CSV to the file named by -o and nothing to stdout', () => {
    const file = join(mkdtempSync(join(tmpdir(), 'hexloom-cli-simulate-')), 'ring.csv');
    const r = spawnSync('npx', ['--no-install', 'hexloom', 'simulate', CONFIG, '--from', 'in', '--to', 'out', '--points', '64', '-o', file], { cwd: repoRoot, encoding: 'utf8' });
    expect(r.status, r.stderr).toBe(0);
    expect(r.stdout).toBe('');
    expect(readSpectrumCsv(readFileSync(file, 'utf8')).frequenciesHz.length).toBe(64);
  }, 60_000);

  it('names an unknown port and exits with status 1', () => {
    const r = spawnSync('npx', ['--no-install', 'hexloom', 'simulate', CONFIG, '--from', 'nowhere', '--to', 'out'], { cwd: repoRoot, encoding: 'utf8' });
    expect(r.status).toBe(1);
    expect(r.stderr).toMatch(/unknown port "nowhere"/);
  }, 60_000);
});

describe('hexloom sparams', () => {
  it('prints a Touchstone 2.0 file between the chosen ports', () => {
    const text = run('sparams', CONFIG, '--ports', 'in,out', '--points', '16', '--touchstone', '2.0', '--data', 'DB');
    expect(text).toContain('[Version] 2.0');
    const t = readTouchstone(text);
    expect(t.portCount).toBe(2);
    expect(t.format).toBe('DB');
  }, 60_000);

  it('prints the JSON S-parameter file for every port by default', () => {
    const file = sParametersFileSchema.parse(JSON.parse(run('sparams', CONFIG, '--points', '4', '--format', 'json')));
    expect(file.ports.length).toBeGreaterThan(2);
    expect(file.re.length).toBe(4);
    expect(file.re[0]!.length).toBe(file.ports.length);
  }, 60_000);
});
