// Runs the mesh examples: the README example, and the example files through the schemas and the CLI.
import { execFileSync } from 'node:child_process';
import { mkdtempSync, readFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { fileURLToPath } from 'node:url';
import { describe, expect, it } from 'vitest';
import { configurationSchema, meshDefinitionSchema, routeRequestSchema } from '@hexloom/contracts';
import { buildMesh, checkConfiguration } from '@hexloom/mesh';
import { readmeExample } from './readme-example.js';

const here = fileURLToPath(new URL('./', import.meta.url));
const repoRoot = fileURLToPath(new URL('../../', import.meta.url));
const json = (name: string): unknown => JSON.parse(readFileSync(join(here, name), 'utf8'));

describe('mesh examples', () => {
  it('runs the README example: a 10-unit ring and a 40-unit delay line with no violation', () => {
    const r = readmeExample();
    expect(r).toMatchObject({ violations: 0, ringUnits: 10, delayUnits: 40 });
    expect(configurationSchema.safeParse(r.configuration).success).toBe(true);
  });

  it('parses the demo mesh and the request files with the file schemas', () => {
    const mesh = meshDefinitionSchema.parse(json('demo-mesh.json'));
    // 12 x 8 cells: 8 rows x 12 columns (the demo chip, invented); built mesh has 96 cells.
    expect(buildMesh(mesh).cells).toHaveLength(96);
    for (const f of ['notch-ring.request.json', 'delay-line.request.json', 'mzi.request.json']) expect(routeRequestSchema.safeParse(json(f)).success, f).toBe(true);
  });

  it('places the three example requests one after another with the CLI and checks the result', () => {
    const dir = mkdtempSync(join(tmpdir(), 'hexloom-mesh-'));
    const run = (...args: string[]) => execFileSync('npx', ['--no-install', 'hexloom', ...args], { cwd: repoRoot, encoding: 'utf8' });
    run('route', 'examples/mesh/demo-mesh.json', 'examples/mesh/notch-ring.request.json', '-o', join(dir, 'a.json'));
    run('route', join(dir, 'a.json'), 'examples/mesh/delay-line.request.json', '-o', join(dir, 'b.json'));
    run('route', join(dir, 'b.json'), 'examples/mesh/mzi.request.json', '-o', join(dir, 'c.json'));
    const cfg = configurationSchema.parse(JSON.parse(readFileSync(join(dir, 'c.json'), 'utf8')));
    expect(cfg.circuits.map((c) => c.id)).toEqual(['notch', 'delay', 'mzi']);
    expect(checkConfiguration(buildMesh(cfg.mesh), cfg).violations).toEqual([]);
    expect(JSON.parse(run('check', join(dir, 'c.json')))).toEqual({ ok: true, violations: [] });
  }, 60_000);
});
