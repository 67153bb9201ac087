// Chips, calibration uploads and versioned configurations: 409 on a stale save, concurrent saves, diff, duplicate.
import type { INestApplication } from '@nestjs/common';
import { buildMesh, placeCircuit, type Configuration } from '@hexloom/mesh';
import { staleVersionErrorSchema } from '@hexloom/contracts';
import { count, eq } from 'drizzle-orm';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { calibrations, configurationVersions } from '../src/db/schema/index.js';
import type { Chip, ConfigurationDetail, ConfigurationVersion } from './support/contract-types.js';
import { createChip } from './support/demo-chip.js';
import { type Agent, signIn } from './support/sign-in.js';
import { databaseOf, demoTeamId, startTestApp } from './support/test-app.js';

describe('chips, calibration and configuration versions', () => {
  let sut: INestApplication;
  let designer: Agent;
  let owner: Agent;
  let teamId = '';
  let chip: Chip;

  beforeAll(async () => {
    sut = await startTestApp();
    designer = (await signIn(sut, { login: 'noor' })).agent;
    owner = (await signIn(sut, { login: 'ilse' })).agent;
    teamId = await demoTeamId(sut);
    chip = await createChip(designer, teamId, 'versions chip');
  });
  afterAll(async () => {
    await sut.close();
  });

  const calibrationRows = async (): Promise<number> => {
    const [row] = await databaseOf(sut).select({ n: count() }).from(calibrations).where(eq(calibrations.chipId, chip.id));
    return row?.n ?? 0;
  };

  it('creates a chip from a template with I/O ports on both sides, and exports it as chip JSON', async () => {
    expect(chip.definition.shape).toEqual({ kind: 'rectangle', rows: 3, columns: 4 });
    expect(chip.definition.ports.length).toBeGreaterThanOrEqual(4);
    const res = await designer.get(`/api/teams/${teamId}/chips/${chip.id}/export`).expect(200);
    expect(res.headers['content-disposition']).toMatch(/^attachment; filename="?versions-chip\.chip\.json"?$/);
    expect(JSON.parse(res.text)).toEqual(chip.definition);
  });

  it('creates a chip from an uploaded chip JSON, and refuses one whose ports are not on the mesh (422)', async () => {
    const copy = await designer.post(`/api/teams/${teamId}/chips`).send({ definition: { ...chip.definition, name: 'copied chip' } }).expect(201);
    expect(copy.body.definition.name).toBe('copied chip');
    const bad = await designer.post(`/api/teams/${teamId}/chips`).send({ definition: { ...chip.definition, ioSites: ['v(40,40)n'] } });
    expect(bad.status).toBe(422);
    expect(bad.body.message).toMatch(/cannot be built/);
  });

  it('imports an uploaded chip JSON file, and refuses a file that is not JSON or not a chip (422)', async () => {
    const exported = (await designer.get(`/api/teams/${teamId}/chips/${chip.id}/export`).expect(200)).text;
    const imported = await designer.post(`/api/teams/${teamId}/chips/import`).attach('file', Buffer.from(exported), 'chip.json').expect(201);
    expect(imported.body.definition).toEqual(chip.definition);
    const notJson = await designer.post(`/api/teams/${teamId}/chips/import`).attach('file', Buffer.from('{ nope'), 'chip.json');
    expect(notJson.status).toBe(422);
    expect(notJson.body.message).toMatch(/"chip.json" is not JSON/);
    const notChip = await designer.post(`/api/teams/${teamId}/chips/import`).attach('file', Buffer.from('{"schemaVersion": 1}'), 'chip.json');
    expect(notChip.status).toBe(422);
    expect(notChip.body.message).toMatch(/is not a chip definition: name:/);
  });

  it('edits the technology profile and dead gates, counting revisions', async () => {
    const gate = buildMesh(chip.definition).gates[5]?.id ?? '';
    const res = await designer
      .patch(`/api/teams/${teamId}/chips/${chip.id}`)
      .send({ technology: { ...chip.definition.technology, lossPerGateDb: 0.3 }, deadGates: [gate] })
      .expect(200);
    expect(res.body).toMatchObject({ revision: 2, definition: { deadGates: [gate], technology: { lossPerGateDb: 0.3 } } });
    const restored = await designer.patch(`/api/teams/${teamId}/chips/${chip.id}`).send({ technology: chip.definition.technology, deadGates: [] }).expect(200);
    expect(restored.body.revision).toBe(3);
    chip = restored.body as Chip;
  });

  it('stores a valid calibration CSV, and refuses bad rows with their line numbers, storing nothing', async () => {
    const gates = buildMesh(chip.definition).gates.slice(0, 2).map((g) => g.id);
    const header = 'gate,shifter,offset_rad,p_pi_mw,resistance_ohm,max_power_mw,max_voltage_v';
    const bad = `${header}\n"${gates[0]}",theta,0.1,22,1200,80,12\n"${gates[1]}",theta,NaN,22,1200,80,12\n"${gates[1]}",phi,0,22,-5,80,12\n`;
    const refused = await designer.put(`/api/teams/${teamId}/chips/${chip.id}/calibration`).attach('file', Buffer.from(bad), 'cal.csv');
    expect(refused.status).toBe(422);
    expect(refused.body.issues).toEqual([
      { path: 'line 3: offset_rad', message: '"NaN" is not a finite number' },
      { path: 'line 4: resistance_ohm', message: '-5 is outside 1 .. 1000000' },
    ]);
    expect(await calibrationRows()).toBe(0);
    await designer.get(`/api/teams/${teamId}/chips/${chip.id}/calibration`).expect(404);
    const good = `${header}\n"${gates[0]}",theta,0.1,22,1200,80,12\n"${gates[1]}",phi,-0.2,21,1150,80,12\n`;
    const stored = await designer.put(`/api/teams/${teamId}/chips/${chip.id}/calibration`).attach('file', Buffer.from(good), 'cal.csv').expect(200);
    expect(stored.body.shifters).toHaveLength(2);
    expect(stored.body.shifters[0]).toMatchObject({ gate: gates[0], piPowerW: 0.022 });
    expect(await calibrationRows()).toBe(1);
  });

  it('refuses a calibration with the wrong columns, a binary file and a wrong extension, storing nothing', async () => {
    const url = `/api/teams/${teamId}/chips/${chip.id}/calibration`;
    const wrong = await designer.put(url).attach('file', Buffer.from('gate,phase\n"g(0,0)e",1\n'), 'cal.csv');
    expect(wrong.status).toBe(422);
    expect(wrong.body.message).toMatch(/line 1: the header lacks column\(s\) shifter, offset_rad/);
    const binary = await designer.put(url).attach('file', Buffer.from([0x89, 0x50, 0x4e, 0x47, 0x00, 0x01, 0xff]), 'cal.csv');
    expect(binary.status).toBe(415);
    expect(binary.body.message).toMatch(/NUL bytes/);
    const png = await designer.put(url).attach('file', Buffer.from('gate\n'), 'cal.png');
    expect(png.status).toBe(415);
    expect(await calibrationRows()).toBe(1);
  });

  const placeOn = (content: Configuration, id: string): Configuration => {
    const ports = buildMesh(content.mesh).ports;
    const from = ports[0]?.id ?? '';
    const to = ports[ports.length - 1]?.id ?? '';
    const placed = placeCircuit(content, { id, kind: 'path', from, to });
    if (!placed.ok) throw new Error(placed.message);
    return placed.configuration;
  };

  it('saves versions, answers a stale save with 409 and the newer version, and keeps both versions intact', async () => {
    const created = (await designer.post(`/api/teams/${teamId}/chips/${chip.id}/configurations`).send({ name: 'bus path' }).expect(201)).body as ConfigurationDetail;
    expect(created.headVersion).toBe(1);
    const v1 = (await designer.get(`/api/teams/${teamId}/configurations/${created.id}/versions/1`).expect(200)).body as ConfigurationVersion;
    expect(v1.content.gates).toEqual([]);
    const withPath = placeOn(v1.content, 'bus');
    const v2 = await designer.post(`/api/teams/${teamId}/configurations/${created.id}/versions`).send({ baseVersion: 1, content: withPath, note: 'bus path' }).expect(201);
    expect(v2.body).toMatchObject({ number: 2, status: 'draft', author: 'noor' });
    const stale = await owner.post(`/api/teams/${teamId}/configurations/${created.id}/versions`).send({ baseVersion: 1, content: v1.content, note: 'stale' });
    expect(stale.status).toBe(409);
    const body = staleVersionErrorSchema.parse(stale.body);
    expect(body.latest.number).toBe(2);
    expect(body.latest.content).toEqual(withPath);
    const rows = await databaseOf(sut).select().from(configurationVersions).where(eq(configurationVersions.configurationId, created.id));
    expect(rows.map((r) => r.number).sort()).toEqual([1, 2]);
  });

  it('lets exactly one of two concurrent saves on the same base win; the other gets 409', async () => {
    const created = (await designer.post(`/api/teams/${teamId}/chips/${chip.id}/configurations`).send({ name: 'race' }).expect(201)).body as ConfigurationDetail;
    const v1 = (await designer.get(`/api/teams/${teamId}/configurations/${created.id}/versions/1`).expect(200)).body as ConfigurationVersion;
    const mine = placeOn(v1.content, 'mine');
    const theirs = { ...v1.content, parkedState: 'cross' as const };
    const [a, b] = await Promise.all([
      designer.post(`/api/teams/${teamId}/configurations/${created.id}/versions`).send({ baseVersion: 1, content: mine, note: 'designer' }),
      owner.post(`/api/teams/${teamId}/configurations/${created.id}/versions`).send({ baseVersion: 1, content: theirs, note: 'owner' }),
    ]);
    expect([a.status, b.status].sort()).toEqual([201, 409]);
    const winner = a.status === 201 ? { res: a, content: mine } : { res: b, content: theirs };
    const loser = a.status === 201 ? b : a;
    expect(loser.body.latest.content).toEqual(winner.content);
    const v2 = (await designer.get(`/api/teams/${teamId}/configurations/${created.id}/versions/2`).expect(200)).body as ConfigurationVersion;
    expect(v2.content).toEqual(winner.content);
    expect((await designer.get(`/api/teams/${teamId}/configurations/${created.id}/versions/1`).expect(200)).body.content).toEqual(v1.content);
    await designer.get(`/api/teams/${teamId}/configurations/${created.id}/versions/3`).expect(404);
  });

  it('diffs two versions and duplicates a version into a new configuration', async () => {
    const created = (await designer.post(`/api/teams/${teamId}/chips/${chip.id}/configurations`).send({ name: 'diffed' }).expect(201)).body as ConfigurationDetail;
    const v1 = (await designer.get(`/api/teams/${teamId}/configurations/${created.id}/versions/1`).expect(200)).body as ConfigurationVersion;
    const withPath = placeOn(v1.content, 'bus');
    await designer
      .post(`/api/teams/${teamId}/configurations/${created.id}/versions`)
      .send({ baseVersion: 1, content: withPath, figures: { bus: { insertionLossDb: 2.5 } } })
      .expect(201);
    // Figures are the server's to compute from the specs; a figure the client sends is not stored.
    expect((await designer.get(`/api/teams/${teamId}/configurations/${created.id}/versions/2`).expect(200)).body.figures).toEqual({});
    const diff = await designer.get(`/api/teams/${teamId}/configurations/${created.id}/diff?from=1&to=2`).expect(200);
    expect(diff.body.circuitsAdded).toEqual(['bus']);
    expect(diff.body.circuitsRemoved).toEqual([]);
    expect(diff.body.gatesChanged).toHaveLength(withPath.gates.length);
    expect(diff.body.figureChanges).toEqual([]);
    const back = await designer.get(`/api/teams/${teamId}/configurations/${created.id}/diff?from=2&to=1`).expect(200);
    expect(back.body.circuitsRemoved).toEqual(['bus']);
    const copy = await designer.post(`/api/teams/${teamId}/configurations/${created.id}/duplicate`).send({ name: 'diffed copy', fromVersion: 2 }).expect(201);
    expect(copy.body).toMatchObject({ name: 'diffed copy', headVersion: 1 });
    const copied = await designer.get(`/api/teams/${teamId}/configurations/${copy.body.id}/versions/1`).expect(200);
    expect(copied.body.content).toEqual(withPath);
  });

  it('refuses a content that breaks the mesh rules with 422 and saves nothing', async () => {
    const created = (await designer.post(`/api/teams/${teamId}/chips/${chip.id}/configurations`).send({ name: 'broken' }).expect(201)).body as ConfigurationDetail;
    const v1 = (await designer.get(`/api/teams/${teamId}/configurations/${created.id}/versions/1`).expect(200)).body as ConfigurationVersion;
    const bad = { ...v1.content, gates: [{ gate: 'g(90,90)e', state: 'cross' as const }] };
    const res = await designer.post(`/api/teams/${teamId}/configurations/${created.id}/versions`).send({ baseVersion: 1, content: bad });
    expect(res.status).toBe(422);
    const otherShape = { ...v1.content, mesh: { ...v1.content.mesh, shape: { kind: 'hexagon' as const, radius: 1 }, ioSites: [], ports: [] } };
    const wrongChip = await designer.post(`/api/teams/${teamId}/configurations/${created.id}/versions`).send({ baseVersion: 1, content: otherShape });
    expect(wrongChip.status).toBe(422);
    expect(wrongChip.body.issues).toEqual([{ path: 'content.mesh.shape', message: "not the chip's shape" }]);
    expect((await designer.get(`/api/teams/${teamId}/configurations/${created.id}`).expect(200)).body.headVersion).toBe(1);
  });
});
