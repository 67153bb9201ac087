// The demo designs seed: the invented 12 x 8 chip, its calibration, three configurations in three review states.
import type { INestApplication } from '@nestjs/common';
import { benchExportSchema, comparisonSchema, type ConfigurationSummary } from '@hexloom/contracts';
import { count } from 'drizzle-orm';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { DEMO_CHIP_NAME } from '../src/db/demo-designs.js';
import { chips, configurations } from '../src/db/schema/index.js';
import { seedDemoDesigns } from '../src/db/seed-demo-designs.js';
import type { Chip } from './support/contract-types.js';
import { type Agent, signIn } from './support/sign-in.js';
import { databaseOf, demoTeamId, startTestApp } from './support/test-app.js';

describe('the demo designs seed', () => {
  let sut: INestApplication;
  let dario: Agent;
  let teamId = '';
  let chip: Chip;
  let list: ConfigurationSummary[];

  beforeAll(async () => {
    sut = await startTestApp({ seedDemoDesigns: true });
    dario = (await signIn(sut, { login: 'dario' })).agent;
    teamId = await demoTeamId(sut);
    chip = ((await dario.get(`/api/teams/${teamId}/chips`).expect(200)).body as Chip[]).find((c) => c.name === DEMO_CHIP_NAME) as Chip;
    list = (await dario.get(`/api/teams/${teamId}/chips/${chip.id}/configurations`).expect(200)).body as ConfigurationSummary[];
  }, 120_000);
  afterAll(async () => {
    await sut.close();
  });

  it('creates the invented 12 x 8 chip with the demo technology and a calibration of every shifter', async () => {
    expect(chip.definition.shape).toEqual({ kind: 'rectangle', rows: 8, columns: 12 });
    expect(chip.definition.technology).toMatchObject({ unitLengthUm: 650, groupIndex: 4.2, lossPerGateDb: 0.25, extinctionDb: 25, phaseShifter: { piPowerW: 0.022, resistanceOhm: 1200 } });
    expect(chip.hasCalibration).toBe(true);
    const calibration = (await dario.get(`/api/teams/${teamId}/chips/${chip.id}/calibration`).expect(200)).body as { shifters: unknown[] };
    expect(calibration.shifters.length).toBeGreaterThan(300);
  });

  it('holds a delay set, a ring notch and a coupled-ring band-pass in three review states', () => {
    expect(list.map((c) => [c.name, c.headVersion, c.headStatus]).sort()).toEqual([
      ['Beam-steering delay set', 2, 'approved'],
      ['Downlink channel band-pass', 2, 'changes_requested'],
      ['Interferer notch', 2, 'in_review'],
    ]);
  });

  it('carries comments, and a synthetic measured spectrum that matches the model to about its noise', async () => {
    const notch = list.find((c) => c.name === 'Interferer notch') as ConfigurationSummary;
    const base = `/api/teams/${teamId}/configurations/${notch.id}/versions/2`;
    expect(((await dario.get(`${base}/comments`).expect(200)).body as { anchor: unknown }[])[0]?.anchor).toMatchObject({ gate: expect.any(String) });
    const [measured] = (await dario.get(`${base}/measurements`).expect(200)).body as { id: string; label: string }[];
    expect(measured?.label).toMatch(/synthetic/);
    const cmp = comparisonSchema.parse((await dario.get(`${base}/measurements/${measured?.id}/comparison`).expect(200)).body);
    // Seeded normal noise of 0.15 dB standard deviation: the RMS residual of 121 points is near 0.15 dB (from memory: chi-square spread).
    expect(cmp.figures.rmsResidualDb).toBeGreaterThan(0.1);
    expect(cmp.figures.rmsResidualDb).toBeLessThan(0.2);
    const bandpass = list.find((c) => c.name === 'Downlink channel band-pass') as ConfigurationSummary;
    const thread = (await dario.get(`/api/teams/${teamId}/configurations/${bandpass.id}/versions/2/comments`).expect(200)).body as { id: string; parentId: string | null }[];
    expect(thread[1]?.parentId).toBe(thread[0]?.id);
  });

  it('exports the approved delay set for the bench within the demo drive limits', async () => {
    const delay = list.find((c) => c.name === 'Beam-steering delay set') as ConfigurationSummary;
    const res = await dario.get(`/api/teams/${teamId}/configurations/${delay.id}/versions/2/bench-export`).expect(200);
    const exported = benchExportSchema.parse(JSON.parse(res.text));
    expect(exported.approval).toBe('approved');
    expect(exported.drives.every((d) => d.source === 'calibration' && d.powerW <= 0.06)).toBe(true);
  });

  it('seeds nothing on a second run', async () => {
    const before = [(await databaseOf(sut).select({ n: count() }).from(chips))[0]?.n, (await databaseOf(sut).select({ n: count() }).from(configurations))[0]?.n];
    expect((await seedDemoDesigns(databaseOf(sut))).created).toBe(false);
    const after = [(await databaseOf(sut).select({ n: count() }).from(chips))[0]?.n, (await databaseOf(sut).select({ n: count() }).from(configurations))[0]?.n];
    expect(after).toEqual(before);
  });
});
