import { spawnSync } from 'node:child_process';
import { mkdtempSync, readFileSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { fileURLToPath } from 'node:url';
import { describe, expect, it } from 'vitest';
import { configurationSchema, meshDefinitionSchema } from '@hexloom/contracts';

const repoRoot = fileURLToPath(new URL('../../../', import.meta.url));
const hexloom = (...args: string[]) => spawnSync('npx', ['--no-install', 'hexloom', ...args], { cwd: repoRoot, encoding: 'utf8' });
const dir = mkdtempSync(join(tmpdir(), 'hexloom-cli-mesh-'));

describe('hexloom mesh, route and check', () => {
  it('makes a radius-2 hexagon with an I/O site on each of its 12k + 6 boundary vertices and two dead gates', () => {
    const r = hexloom('mesh', '--radius', '2', '--io', 'all', '--name', 'hex2', '--dead', 'g(0,0)e,g(1,-1)nw', '-o', join(dir, 'hex2.json'));
    expect(r.status).toBe(0);
    const def = meshDefinitionSchema.parse(JSON.parse(readFileSync(join(dir, 'hex2.json'), 'utf8')));
    expect(def.shape).toEqual({ kind: 'hexagon', radius: 2 });
    // A radius-k block has 12k + 6 boundary vertices (from memory), each an I/O site with two ports.
    expect(def.ioSites).toHaveLength(30);
    expect(def.ports).toHaveLength(60);
    expect(def.deadGates).toEqual(['g(0,0)e', 'g(1,-1)nw']);
  }, 60_000);

  it('routes a path, answers a taken port with exit code 2 and a JSON reason, and removes the circuit', () => {
    const mesh = join(dir, 'demo.json');
    expect(hexloom('mesh', '--rows', '4', '--columns', '6', '-o', mesh).status).toBe(0);
    const ports = meshDefinitionSchema.parse(JSON.parse(readFileSync(mesh, 'utf8'))).ports.map((p) => p.id);
    const first = hexloom('route', mesh, '--request', JSON.stringify({ kind: 'path', id: 'a', from: ports[0], to: ports[ports.length - 1] }), '-o', join(dir, 'a.json'));
    expect(first.status).toBe(0);
    expect(first.stderr).toContain('placed path a');
    const taken = hexloom('route', join(dir, 'a.json'), '--request', JSON.stringify({ kind: 'path', id: 'b', from: ports[0], to: ports[5] }));
    expect(taken.status).toBe(2);
    expect(JSON.parse(taken.stdout)).toMatchObject({ ok: false, reason: 'port-taken' });
    const removed = hexloom('route', join(dir, 'a.json'), '--remove', 'a');
    expect(removed.status).toBe(0);
    expect(configurationSchema.parse(JSON.parse(removed.stdout)).circuits).toEqual([]);
  }, 90_000);

  it('exits with code 3 and lists the violation when a gate setting was edited by hand', () => {
    const cfg = configurationSchema.parse(JSON.parse(readFileSync(join(dir, 'a.json'), 'utf8')));
    const edited = { ...cfg, gates: cfg.gates.map((g, i) => (i === 0 ? { ...g, state: g.state === 'bar' ? 'cross' : 'bar' } : g)) };
    writeFileSync(join(dir, 'edited.json'), JSON.stringify(edited));
    const r = hexloom('check', join(dir, 'edited.json'));
    expect(r.status).toBe(3);
    expect(JSON.parse(r.stdout).violations[0]).toMatchObject({ code: 'inconsistent-state', gates: [cfg.gates[0]!.gate] });
  }, 60_000);
});
