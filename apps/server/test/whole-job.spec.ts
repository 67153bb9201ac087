// The whole job through the API: chip -> calibration -> synthesise -> save -> review -> approve -> bench export
// -> measured upload -> comparison, with the mail in the outbox; plus simulate caching, Touchstone and yield jobs.
import type { INestApplication } from '@nestjs/common';
import { benchExportSchema, comparisonSchema, proposalSchema, spectrumFileSchema, yieldJobSchema, type Proposal, type YieldJob } from '@hexloom/contracts';
import { BENCH_CAUTIONS, verifyBenchExport, type BenchExport } from '@hexloom/bench';
import { buildMesh } from '@hexloom/mesh';
import { readTouchstone } from '@hexloom/solver';
import { count, eq } from 'drizzle-orm';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { measurements } from '../src/db/schema/index.js';
import type { Chip, ConfigurationDetail } from './support/contract-types.js';
import { createChip } from './support/demo-chip.js';
import { sidePorts } from './support/side-ports.js';
import { type Agent, signIn } from './support/sign-in.js';
import { databaseOf, demoTeamId, startTestApp } from './support/test-app.js';

describe('the whole job, from a new chip to a measured comparison', () => {
  let sut: INestApplication;
  let noor: Agent;
  let caspar: Agent;
  let wen: Agent;
  let ilse: Agent;
  let teamId = '';
  let chip: Chip;
  let ports: { west: string[]; east: string[] };
  let configuration: ConfigurationDetail;
  let base = '';
  const NOTCH_OFFSET_HZ = 2e9;

  beforeAll(async () => {
    sut = await startTestApp();
    noor = (await signIn(sut, { login: 'noor' })).agent;
    caspar = (await signIn(sut, { login: 'caspar' })).agent;
    wen = (await signIn(sut, { login: 'wen' })).agent;
    ilse = (await signIn(sut, { login: 'ilse' })).agent;
    teamId = await demoTeamId(sut);
  });
  afterAll(async () => {
    await sut.close();
  });

  it('creates a chip and uploads its calibration', async () => {
    chip = await createChip(noor, teamId, 'whole job chip', 4, 6);
    ports = sidePorts(chip.definition);
    const gates = buildMesh(chip.definition).gates.slice(0, 4).map((g) => g.id);
    const csv = ['gate,shifter,offset_rad,p_pi_mw,resistance_ohm,max_power_mw,max_voltage_v', ...gates.map((g, i) => `"${g}",theta,${(0.1 * i).toFixed(1)},22,1200,80,12`)].join('\n');
    const res = await noor.put(`/api/teams/${teamId}/chips/${chip.id}/calibration`).attach('file', Buffer.from(csv), 'calibration.csv').expect(200);
    expect(res.body.shifters).toHaveLength(4);
  });

  it('synthesises a ring notch into a proposal and saves it as version 2', async () => {
    configuration = (await noor.post(`/api/teams/${teamId}/chips/${chip.id}/configurations`).send({ name: 'ring notch' }).expect(201)).body as ConfigurationDetail;
    base = `/api/teams/${teamId}/configurations/${configuration.id}`;
    const spec = {
      schemaVersion: 1,
      name: 'notch at +2 GHz',
      spec: { kind: 'ring-notch', from: ports.west[1], to: ports.east[1], centreOffsetHz: NOTCH_OFFSET_HZ, target: { notchDepthDb: 20, regime: 'under' }, ring: { free: true } },
      mask: { regions: [] },
    };
    const res = await noor.post(`${base}/versions/1/synthesise`).send({ circuitId: 'notch', spec }).expect(200);
    const proposal = proposalSchema.parse(res.body) as Proposal;
    if (!proposal.ok) throw new Error(`synthesis failed: ${proposal.message}`);
    expect(proposal.basedOnVersion).toBe(1);
    expect(proposal.content.circuits.map((c) => c.id)).toEqual(['notch']);
    expect(proposal.specs).toHaveLength(1);
    const saved = await noor.post(`${base}/versions`).send({ baseVersion: 1, content: proposal.content, specs: proposal.specs, figures: proposal.figures, note: 'ring notch' }).expect(201);
    expect(saved.body).toMatchObject({ number: 2, status: 'draft' });
  });

  it('simulates the saved version, answering the second identical request from the cache', async () => {
    const body = { from: ports.west[1], to: ports.east[1], grid: { kind: 'span', startOffsetHz: 0, stopOffsetHz: 4e9, points: 201 } };
    const first = await noor.post(`${base}/versions/2/simulate`).send(body).expect(200);
    expect(first.headers['x-hexloom-cache']).toBe('miss');
    const spectrum = spectrumFileSchema.parse(first.body);
    const db = spectrum.points.amplitudeDb.map((v) => v ?? -300);
    const deepest = db.indexOf(Math.min(...db));
    // The notch sits at the requested centre, within one grid step (20 MHz) plus the tuning tolerance.
    expect(Math.abs((spectrum.points.offsetHz[deepest] ?? 0) - NOTCH_OFFSET_HZ)).toBeLessThan(60e6);
    const second = await caspar.post(`${base}/versions/2/simulate`).send(body).expect(200);
    expect(second.headers['x-hexloom-cache']).toBe('hit');
    expect(second.body).toEqual(first.body);
  });

  it('lets only a named reviewer who is not the author decide, and mails the reviewer and the author', async () => {
    await noor.post(`${base}/versions/2/reviews`).send({ reviewers: ['noor'] }).expect(422);
    await noor.post(`${base}/versions/2/reviews`).send({ reviewers: ['caspar'], message: 'Please check the notch depth.' }).expect(201);
    expect((await noor.get(`${base}/versions/2`).expect(200)).body.status).toBe('in_review');
    await noor.post(`${base}/versions/2/decision`).send({ decision: 'approve' }).expect(403);
    await wen.post(`${base}/versions/2/decision`).send({ decision: 'approve' }).expect(403);
    await caspar.post(`${base}/versions/2/comments`).send({ body: 'Looks right; @noor the depth meets 20 dB.', anchor: { fromHz: 1.9e9, toHz: 2.1e9 } }).expect(201);
    const decided = await caspar.post(`${base}/versions/2/decision`).send({ decision: 'approve', note: 'Approved for the bench.' }).expect(200);
    expect(decided.body[0]).toMatchObject({ reviewer: 'caspar', decision: 'approve' });
    expect((await noor.get(`${base}/versions/2`).expect(200)).body).toMatchObject({ status: 'approved', approvedBy: 'caspar' });
    const outbox = (await ilse.get(`/api/teams/${teamId}/outbox`).expect(200)).body as { kind: string; to: string; subject: string }[];
    expect(outbox.map((m) => [m.kind, m.to]).sort()).toEqual(
      expect.arrayContaining([
        ['review_requested', 'caspar@kestrel-vale.example'],
        ['mention', 'noor@kestrel-vale.example'],
        ['review_decided', 'noor@kestrel-vale.example'],
      ]),
    );
  });

  it('exports the approved version for the bench as CSV and JSON, with cautions, drive values and a valid checksum', async () => {
    const csv = await noor.get(`${base}/versions/2/bench-export?format=csv`).expect(200);
    expect(csv.headers['content-type']).toMatch(/^text\/csv/);
    expect(csv.text).toContain('# approval: approved');
    for (const c of BENCH_CAUTIONS) expect(csv.text).toContain(`# caution: ${c}`);
    const json = await noor.get(`${base}/versions/2/bench-export`).expect(200);
    const exported = benchExportSchema.parse(JSON.parse(json.text)) as BenchExport;
    expect(exported.approval).toBe('approved');
    expect(await verifyBenchExport(exported)).toBe(true);
    expect(csv.text).toContain(`# checksum_sha256: ${exported.checksum}`);
    expect(exported.drives.filter((d) => d.source === 'calibration')).toHaveLength(4);
    // Total electrical power is the sum of every heater's power (common practice).
    expect(exported.totalPowerW).toBeCloseTo(exported.drives.reduce((s, d) => s + d.powerW, 0), 12);
  });

  it('exports the simulated S-parameters as a Touchstone file the reader accepts', async () => {
    const res = await noor.get(`${base}/versions/2/touchstone`).query({ ports: `${ports.west[1]};${ports.east[1]}`, startOffsetHz: 0, stopOffsetHz: 4e9, points: 11 });
    expect(res.status).toBe(200);
    expect(res.headers['content-disposition']).toMatch(/\.s2p"?$/);
    const file = readTouchstone(res.text, { fileName: 'x.s2p' });
    expect(file.portCount).toBe(2);
    expect(file.frequenciesHz).toHaveLength(11);
    expect(res.text).toContain('! caution: Drive values can destroy a chip');
    // The exported simulation, uploaded back as a measurement, compares with the simulation to within print precision.
    const uploaded = await noor.post(`${base}/versions/2/measurements`).field('from', ports.west[1] ?? '').field('to', ports.east[1] ?? '').attach('file', Buffer.from(res.text), 'sim.s2p').expect(201);
    expect(uploaded.body).toMatchObject({ format: 'touchstone', points: 11 });
    const cmp = comparisonSchema.parse((await noor.get(`${base}/versions/2/measurements/${uploaded.body.id}/comparison`).expect(200)).body);
    expect(cmp.figures.maxAbsResidualDb).toBeLessThan(1e-6);
  });

  it('uploads a measured spectrum and compares it with the simulation on the measured grid', async () => {
    const f0 = chip.definition.technology.referenceFrequencyHz;
    const sim = spectrumFileSchema.parse(
      (await noor.post(`${base}/versions/2/simulate`).send({ from: ports.west[1], to: ports.east[1], grid: { kind: 'span', startOffsetHz: 0.5e9, stopOffsetHz: 3.5e9, points: 61 } }).expect(200)).body,
    );
    // A deterministic +/-0.1 dB ripple stands in for bench noise (synthetic data).
    const rows = sim.points.offsetHz.map((f, i) => `${f0 + f},${((sim.points.amplitudeDb[i] ?? -300) + (i % 2 === 0 ? 0.1 : -0.1)).toFixed(6)}`);
    const csv = ['# synthetic measurement generated from the model', 'frequency_hz,amplitude_db', ...rows].join('\n');
    const uploaded = await caspar.post(`${base}/versions/2/measurements`).field('from', ports.west[1] ?? '').field('to', ports.east[1] ?? '').field('label', 'synthetic').attach('file', Buffer.from(csv), 'bench.csv').expect(201);
    expect(uploaded.body).toMatchObject({ format: 'csv', points: 61, label: 'synthetic' });
    const cmp = comparisonSchema.parse((await noor.get(`${base}/versions/2/measurements/${uploaded.body.id}/comparison`).expect(200)).body);
    expect(cmp.figures.points).toBe(61);
    expect(cmp.figures.rmsResidualDb).toBeCloseTo(0.1, 4);
    expect(Math.abs(cmp.figures.meanResidualDb)).toBeLessThan(0.01);
  });

  it('refuses bad measurement uploads with 413, 415 and 422 and stores nothing', async () => {
    const stored = async (): Promise<number> => (await databaseOf(sut).select({ n: count() }).from(measurements))[0]?.n ?? -1;
    const before = await stored();
    const send = (content: Buffer, name: string) =>
      caspar.post(`${base}/versions/2/measurements`).field('from', ports.west[1] ?? '').field('to', ports.east[1] ?? '').attach('file', content, name);
    const huge = await send(Buffer.alloc(3 * 1024 * 1024, 'a'), 'huge.csv');
    expect(huge.status).toBe(413);
    const binary = await send(Buffer.from([0x00, 0x01, 0x02, 0xff, 0xfe]), 'junk.csv');
    expect(binary.status).toBe(415);
    const exe = await send(Buffer.from('MZ'), 'tool.exe');
    expect(exe.status).toBe(415);
    const columns = await send(Buffer.from('freq,power\n1,2\n'), 'cols.csv');
    expect(columns.status).toBe(422);
    expect(columns.body.message).toMatch(/csv line 1: the header needs a frequency_hz or frequency_ghz column/);
    const nan = await send(Buffer.from('frequency_hz,amplitude_db\n193.4e12,-3\n193.41e12,NaN\n'), 'nan.csv');
    expect(nan.status).toBe(422);
    expect(nan.body.message).toMatch(/csv line 3/);
    const ghzAsHz = await send(Buffer.from('frequency_hz,amplitude_db\n1.0,-3\n2.0,-4\n'), 'units.csv');
    expect(ghzAsHz.status).toBe(422);
    expect(ghzAsHz.body.message).toMatch(/point 1 is at 1 Hz/);
    const badPort = await caspar.post(`${base}/versions/2/measurements`).field('from', 'nowhere').field('to', ports.east[1] ?? '').attach('file', Buffer.from('frequency_hz,amplitude_db\n193.4e12,-3\n193.41e12,-4\n'), 'ok.csv');
    expect(badPort.status).toBe(422);
    expect(await stored()).toBe(before);
  });

  it('marks a later save as a new draft that needs its own approval, and exports it as not approved', async () => {
    const v2 = (await noor.get(`${base}/versions/2`).expect(200)).body;
    await noor.post(`${base}/versions`).send({ baseVersion: 2, content: { ...v2.content, parkedState: 'cross' }, specs: v2.specs, figures: v2.figures }).expect(201);
    expect((await noor.get(`${base}/versions/3`).expect(200)).body.status).toBe('draft');
    const csv = await noor.get(`${base}/versions/3/bench-export?format=csv`).expect(200);
    expect(csv.text).toContain('# approval: not approved');
    await caspar.post(`${base}/versions/3/decision`).send({ decision: 'approve' }).expect(403);
  });

  it('runs a Monte Carlo yield job in worker threads to the end, and cancels another', async () => {
    const body = {
      from: ports.west[1], to: ports.east[1], grid: { kind: 'span', startOffsetHz: 1e9, stopOffsetHz: 3e9, points: 41 },
      mask: { regions: [{ kind: 'stop', range: { fromHz: 1.95e9, toHz: 2.05e9 }, minRejectionDb: 10 }] },
      runs: 6, seed: 7, couplerSigmaRad: 0.01, phaseSigmaRad: 0.02,
    };
    const started = yieldJobSchema.parse((await noor.post(`${base}/versions/2/yield-jobs`).send(body).expect(202)).body);
    expect(started).toMatchObject({ status: 'running', runsTotal: 6 });
    let job: YieldJob = started;
    for (let i = 0; i < 240 && job.status === 'running'; i++) {
      await new Promise((r) => setTimeout(r, 250));
      job = (await noor.get(`${base}/versions/2/yield-jobs/${started.id}`).expect(200)).body as YieldJob;
    }
    expect(job.status).toBe('done');
    expect(job.summary?.runs).toBe(6);
    expect(job.summary?.yield).toBeGreaterThanOrEqual(0);
    const events = await noor.get(`${base}/versions/2/yield-jobs/${started.id}/events`).buffer(true).parse((res, cb) => {
      let text = '';
      res.on('data', (chunk: Buffer) => (text += chunk.toString()));
      res.on('end', () => cb(null, text));
    });
    expect(String(events.body)).toMatch(/event: progress\nid: \d+\ndata: \{.*"status":"done"/);
    const long = yieldJobSchema.parse((await noor.post(`${base}/versions/2/yield-jobs`).send({ ...body, runs: 5000 }).expect(202)).body);
    const cancelled = await noor.delete(`${base}/versions/2/yield-jobs/${long.id}`).expect(200);
    expect(cancelled.body.status).toBe('cancelled');
    await new Promise((r) => setTimeout(r, 500));
    expect((await noor.get(`${base}/versions/2/yield-jobs/${long.id}`).expect(200)).body.status).toBe('cancelled');
  }, 90_000);
});
