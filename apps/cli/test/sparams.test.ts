// `hexloom sparams --ports` with port ids that hold commas, labels and `;`, and `-o` writing the file.
import { spawnSync } from 'node:child_process';
import { mkdtempSync, readFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { fileURLToPath } from 'node:url';
import { describe, expect, it } from 'vitest';
import { readTouchstone } from '@hexloom/solver';
import { splitPortList } from '../src/commands/sparams.js';

const repoRoot = fileURLToPath(new URL('../../../', import.meta.url));
const CONFIG = 'examples/solver/ring-notch.configuration.json';
const hexloom = (...args: string[]) => spawnSync('npx', ['--no-install', 'hexloom', ...args], { cwd: repoRoot, encoding: 'utf8', maxBuffer: 64 << 20 });
const dir = mkdtempSync(join(tmpdir(), 'hexloom-cli-sparams-'));
/** Ports of the example chip: `in` is the label of v(-1,-1)n/g(-1,-1)nw, `out` of v(-1,2)s/g(-2,3)ne. */
const IN = 'v(-1,-1)n/g(-1,-1)nw', OUT = 'v(-1,2)s/g(-2,3)ne', THIRD = 'v(0,3)n/g(0,3)nw';
const portLines = (text: string): string[] => text.split('\n').filter((l) => l.startsWith('! port '));

describe('splitPortList', () => {
  it('keeps the commas inside the coordinates of port ids and splits on the commas between ports', () => {
    expect(splitPortList(`${IN},${OUT}`)).toEqual([IN, OUT]);
    expect(splitPortList('v(-1,0)n/g(-1,-1)e, W03,in')).toEqual(['v(-1,0)n/g(-1,-1)e', 'W03', 'in']);
  });

  it('splits on semicolons too and drops blank entries', () => {
    expect(splitPortList(` ${IN} ; W03;;${OUT}; `)).toEqual([IN, 'W03', OUT]);
    expect(splitPortList(' , ; ')).toEqual([]);
  });
});

describe('hexloom sparams --ports', () => {
  it('takes port ids that hold commas, mixed with labels, and numbers the ports in the order given', () => {
    const r = hexloom('sparams', CONFIG, '--ports', `${THIRD},in,${OUT}`, '--points', '8');
    expect(r.status, r.stderr).toBe(0);
    expect(portLines(r.stdout)).toEqual([`! port 1 = ${THIRD}`, `! port 2 = in (${IN})`, `! port 3 = out (${OUT})`]);
    expect(readTouchstone(r.stdout, { fileName: 'x.s3p' }).portCount).toBe(3);
  }, 60_000);

  it('gives the same file for the list separated by semicolons', () => {
    const commas = hexloom('sparams', CONFIG, '--ports', `${IN},${OUT}`, '--points', '8');
    const semicolons = hexloom('sparams', CONFIG, '--ports', `${IN}; ${OUT}`, '--points', '8');
    expect(commas.status, commas.stderr).toBe(0);
    expect(semicolons.stdout).toBe(commas.stdout);
  }, 60_000);

  it('names an unknown port id whole, commas included, and exits with status 1', () => {
    const r = hexloom('sparams', CONFIG, '--ports', 'in,v(9,9)n/g(9,9)e');
    expect(r.status).toBe(1);
    expect(r.stderr).toMatch(/unknown port "v\(9,9\)n\/g\(9,9\)e"/);
  }, 60_000);

  it('refuses a list that names no port', () => {
    const r = hexloom('sparams', CONFIG, '--ports', ' ; ');
    expect(r.status).toBe(1);
    expect(r.stderr).toMatch(/--ports names no port/);
  }, 60_000);
});

describe('hexloom sparams -o', () => {
  it('writes the Touchstone file to the named file and nothing to stdout', () => {
    const file = join(dir, 'ring.s2p');
    const r = hexloom('sparams', CONFIG, '--ports', 'in;out', '--points', '8', '--touchstone', '2.0', '-o', file);
    expect(r.status, r.stderr).toBe(0);
    expect(r.stdout).toBe('');
    const t = readTouchstone(readFileSync(file, 'utf8'));
    expect(t.version).toBe('2.0');
    expect(t.portCount).toBe(2);
    expect(t.frequenciesHz.length).toBe(8);
  }, 60_000);
});
