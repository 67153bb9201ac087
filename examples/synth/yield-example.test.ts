// Runs `hexloom yield` as a user would: worker threads, a seed, and the same answer however the work is split
// (over threads and over chunk sizes).
import { spawnSync } from 'node:child_process';
import { mkdtempSync, readFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { fileURLToPath } from 'node:url';
import { beforeAll, describe, expect, it, vi } from 'vitest';

vi.setConfig({ testTimeout: 120_000, hookTimeout: 120_000 });

const here = fileURLToPath(new URL('.', import.meta.url));
const bin = fileURLToPath(new URL('../../apps/cli/bin/hexloom.js', import.meta.url));
const out = mkdtempSync(join(tmpdir(), 'hexloom-yield-'));
const spec = join(here, 'coupled-ring-bandpass.spec.json');
const configuration = join(out, 'band-pass.configuration.json');
const hexloom = (...args: string[]) => spawnSync(process.execPath, [bin, ...args], { encoding: 'utf8' });

type Summary = { runs: number; yield: number; yieldStdError: number; threads: number; figures: Record<string, { mean: number }>; sensitivity?: { gate: string }[] };

beforeAll(() => {
  const run = hexloom('synth', spec, '--chip', join(here, 'demo-chip.mesh.json'), '-o', configuration);
  expect(run.status, run.stderr).toBe(0);
});

describe('hexloom yield', () => {
  it('gives the same seeded result on one thread and on two, with a progress line and a sensitivity list', () => {
    const one = hexloom('yield', configuration, '--spec', spec, '--runs', '24', '--chunk', '6', '--threads', '1', '--seed', '7', '-o', join(out, 'one.json'));
    const two = hexloom('yield', configuration, '--spec', spec, '--runs', '24', '--chunk', '6', '--threads', '2', '--seed', '7', '--sensitivity', '-o', join(out, 'two.json'));
    expect(one.status, one.stderr).toBe(0);
    expect(two.status, two.stderr).toBe(0);
    expect(two.stderr).toMatch(/yield \d+\.\d %/);
    const a = JSON.parse(readFileSync(join(out, 'one.json'), 'utf8')) as Summary;
    const b = JSON.parse(readFileSync(join(out, 'two.json'), 'utf8')) as Summary;
    expect(a.runs).toBe(24);
    expect(b.threads).toBe(2);
    expect(b.yield).toBe(a.yield);
    expect(a.figures['rejectionDb']?.mean).toEqual(expect.any(Number));
    expect(b.figures['rejectionDb']?.mean).toBe(a.figures['rejectionDb']?.mean);
    expect(b.figures['worstCheckRatio']?.mean).toBe(a.figures['worstCheckRatio']?.mean);
    expect(b.sensitivity?.length).toBeGreaterThan(0);
    const chunked = hexloom('yield', configuration, '--spec', spec, '--runs', '24', '--chunk', '5', '--threads', '2', '--seed', '7', '--quiet', '-o', join(out, 'five.json'));
    expect(chunked.status, chunked.stderr).toBe(0);
    const c = JSON.parse(readFileSync(join(out, 'five.json'), 'utf8')) as Summary;
    expect(c.yield).toBe(a.yield);
    expect(c.figures).toEqual(a.figures);
  });

  it('loses yield when the phase errors are large', () => {
    const run = hexloom('yield', configuration, '--spec', spec, '--runs', '24', '--chunk', '12', '--phase-sigma', '0.6', '--quiet', '-o', join(out, 'bad.json'));
    expect(run.status, run.stderr).toBe(0);
    expect((JSON.parse(readFileSync(join(out, 'bad.json'), 'utf8')) as Summary).yield).toBeLessThan(0.5);
  });

  it('refuses a negative standard deviation, naming the option', () => {
    const run = hexloom('yield', configuration, '--spec', spec, '--coupler-sigma', '-1');
    expect(run.status).toBe(1);
    expect(run.stderr).toMatch(/--coupler-sigma/);
  });
});
