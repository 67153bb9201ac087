// Through the API: synthesis answers every output with its checks and names, saved figures are the server's,
// other circuits are verified again after an edit, and a gate marked dead marks the versions that use it.
import type { INestApplication } from '@nestjs/common';
import { chipSchema, configurationVersionSchema, FIGURE_CATALOGUE, proposalSchema, type Proposal } from '@hexloom/contracts';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type { Chip, ConfigurationDetail } from './support/contract-types.js';
import { createChip } from './support/demo-chip.js';
import { sidePorts } from './support/side-ports.js';
import { type Agent, signIn } from './support/sign-in.js';
import { demoTeamId, startTestApp } from './support/test-app.js';

type Ok = Extract<Proposal, { ok: true }>;
const ok = (body: unknown): Ok => {
  const p = proposalSchema.parse(body);
  if (!p.ok) throw new Error(`${p.reason}: ${p.message}`);
  return p;
};

describe('engine correctness through the team server', () => {
  let sut: INestApplication;
  let noor: Agent;
  let teamId = '';
  let chip: Chip;
  let ports: { west: string[]; east: string[] };
  let base = '';
  let notch: Ok;

  beforeAll(async () => {
    sut = await startTestApp();
    noor = (await signIn(sut, { login: 'noor' })).agent;
    teamId = await demoTeamId(sut);
    chip = await createChip(noor, teamId, 'engine checks chip', 4, 6);
    ports = sidePorts(chip.definition);
    const created = (await noor.post(`/api/teams/${teamId}/chips/${chip.id}/configurations`).send({ name: 'notch and delay' }).expect(201)).body as ConfigurationDetail;
    base = `/api/teams/${teamId}/configurations/${created.id}`;
  }, 60_000);
  afterAll(async () => {
    await sut.close();
  });

  it('answers a synthesis with every output, its checks (mask and targets), the kind\'s figures and the port names', async () => {
    const spec = { schemaVersion: 1, name: 'notch', spec: { kind: 'ring-notch', from: ports.west[1], to: ports.east[1], centreOffsetHz: 2e9, target: { notchDepthDb: 20, regime: 'under' }, ring: { free: true } }, mask: { regions: [] } };
    notch = ok((await noor.post(`${base}/versions/1/synthesise`).send({ circuitId: 'notch', spec }).expect(200)).body);
    const v = notch.verification[0]!;
    expect(v).toMatchObject({ from: ports.west[1], to: ports.east[1], role: 'main' });
    expect(v.fromName.length).toBeGreaterThan(0);
    expect(v.checks.map((c) => c.quantity)).toEqual(['notch depth', 'notch frequency error']);
    // Only the figures a notch has (no "mean group delay" of a notch).
    expect(Object.keys(v.figures).sort()).toEqual(FIGURE_CATALOGUE['ring-notch'].map((f) => f.name).sort());
    expect(notch.verdict).toMatchObject({ pass: true, failed: 0, checks: 2 });
  });

  it('stores the figures the server computes, not the ones a client sends', async () => {
    const res = await noor.post(`${base}/versions`).send({ baseVersion: 1, content: notch.content, specs: notch.specs, figures: { notch: { notchDepthDb: 99 } } }).expect(201);
    const saved = configurationVersionSchema.parse(res.body);
    expect(saved.figures.notch?.notchDepthDb).toBeCloseTo(notch.figures.notch?.notchDepthDb as number, 9);
    expect(saved.figures.notch?.notchDepthDb).not.toBe(99);
    expect(saved.figures.notch).toMatchObject({ failedChecks: 0, checks: 2 });
  });

  it('verifies the notch again when a delay line is placed next to it, and keeps its gates', async () => {
    const before = configurationVersionSchema.parse((await noor.get(`${base}/versions/2`).expect(200)).body);
    const request = { kind: 'path', id: 'delay', from: ports.west[ports.west.length - 1], to: ports.east[ports.east.length - 1] };
    const placed = ok((await noor.post(`${base}/versions/2/circuits`).send({ request }).expect(200)).body);
    expect(placed.others).toHaveLength(1);
    expect(placed.others[0]).toMatchObject({ circuitId: 'notch' });
    const settings = (c: typeof before.content) => new Map(c.gates.filter((g) => g.circuit === 'notch').map((g) => [g.gate, g]));
    const after = new Map(placed.content.gates.map((g) => [g.gate, g]));
    for (const [gate, s] of settings(before.content)) expect([after.get(gate)?.state, after.get(gate)?.kappa, after.get(gate)?.phaseRad], gate).toEqual([s.state, s.kappa, s.phaseRad]);
  });

  it('marks every version that uses a gate the chip now calls dead, and a re-route avoids it', async () => {
    const version = configurationVersionSchema.parse((await noor.get(`${base}/versions/2`).expect(200)).body);
    const ringGate = version.content.circuits[0]!.paths.find((p) => p.role === 'ring')!.steps[0]!.gate;
    const updated = chipSchema.parse((await noor.patch(`/api/teams/${teamId}/chips/${chip.id}`).send({ deadGates: [ringGate] }).expect(200)).body);
    expect(updated.affectedVersions).toEqual([{ configurationId: version.configurationId, configurationName: 'notch and delay', number: 2, status: 'draft', deadGates: [ringGate] }]);
    expect(configurationVersionSchema.parse((await noor.get(`${base}/versions/2`).expect(200)).body).deadGatesInUse).toEqual([ringGate]);
    const rerouted = ok((await noor.post(`${base}/versions/2/circuits/notch/reroute`).send({}).expect(200)).body);
    const used = rerouted.content.circuits.flatMap((c) => [...c.paths.flatMap((p) => p.steps.map((s) => s.gate)), ...c.couplers.map((k) => k.gate)]);
    expect(used).not.toContain(ringGate);
    expect(rerouted.content.mesh.deadGates).toEqual([ringGate]);
  });
});

describe('the figure catalogue', () => {
  let sut: INestApplication;
  beforeAll(async () => {
    sut = await startTestApp();
  });
  afterAll(async () => {
    await sut.close();
  });
  it('says which figures each kind has, with units, to any signed-in member', async () => {
    const { agent } = await signIn(sut, { login: 'wen' });
    const res = await agent.get('/api/figures').expect(200);
    expect(res.body.kinds['ring-notch'].map((f: { name: string }) => f.name)).toContain('notchDepthDb');
    expect(res.body.kinds['ring-notch'].map((f: { name: string }) => f.name)).not.toContain('meanDelayInBandPs');
    expect(res.body.kinds['ttd-set'].find((f: { name: string }) => f.name === 'stepErrorPs')).toMatchObject({ unit: 'ps' });
  });
});
