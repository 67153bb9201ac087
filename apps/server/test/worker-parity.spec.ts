// The browser's solver worker and the server's simulate route give the same response for the same content (1e-9).
import type { INestApplication } from '@nestjs/common';
import type { ConfigurationFile, ConfigurationSummary, SpectrumFile } from '@hexloom/contracts';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { computeSpectra } from '../../web/src/modules/response/utils/computeSpectra.js';
import { setCouplerKappa } from '../../web/src/modules/response/utils/setCouplerKappa.js';
import { DEMO_CHIP_NAME } from '../src/db/demo-designs.js';
import type { Chip } from './support/contract-types.js';
import { type Agent, signIn } from './support/sign-in.js';
import { demoTeamId, startTestApp } from './support/test-app.js';

const close = (a: readonly (number | null)[], b: readonly (number | null)[]): void => {
  expect(a.length).toBe(b.length);
  a.forEach((x, i) => {
    const y = b[i];
    if (x === null || y === null || y === undefined) expect(x).toBe(y);
    else expect(Math.abs(x - y)).toBeLessThanOrEqual(1e-9 * Math.max(1, Math.abs(y)));
  });
};

describe('the browser worker and the server simulate route', () => {
  let sut: INestApplication;
  let noor: Agent;
  let base = '';
  let content: ConfigurationFile;

  beforeAll(async () => {
    sut = await startTestApp({ seedDemoDesigns: true });
    noor = (await signIn(sut, { login: 'noor' })).agent;
    const teamId = await demoTeamId(sut);
    const chip = ((await noor.get(`/api/teams/${teamId}/chips`).expect(200)).body as Chip[]).find((c) => c.name === DEMO_CHIP_NAME) as Chip;
    const list = (await noor.get(`/api/teams/${teamId}/chips/${chip.id}/configurations`).expect(200)).body as ConfigurationSummary[];
    const bandpass = list.find((c) => c.name === 'Downlink channel band-pass') as ConfigurationSummary;
    base = `/api/teams/${teamId}/configurations/${bandpass.id}`;
    content = ((await noor.get(`${base}/versions/2`).expect(200)).body as { content: ConfigurationFile }).content;
  }, 120_000);
  afterAll(async () => {
    await sut.close();
  });

  for (const [name, grid] of [
    ['the plot span', { kind: 'span', startOffsetHz: -20e9, stopOffsetHz: 20e9, points: 1024 }],
    ['one FSR by FFT', { kind: 'fsr', points: 1024 }],
  ] as const) {
    it(`agree to 1e-9 in amplitude, phase and group delay on the demo band-pass, on ${name}, for its output and its through port`, async () => {
      for (const to of ['E11', 'W14']) {
        const served = (await noor.post(`${base}/versions/2/simulate`).send({ from: 'W11', to, grid }).expect(200)).body as SpectrumFile;
        const [computed] = computeSpectra({ content, pairs: [{ from: 'W11', to }], grid });
        expect(computed?.fromName).toBe(served.fromName);
        expect(computed?.toName).toBe(served.toName);
        close(computed?.points.amplitudeDb ?? [], served.points.amplitudeDb);
        close(computed?.points.phaseDeg ?? [], served.points.phaseDeg);
        close(computed?.points.groupDelayPs ?? [], served.points.groupDelayPs);
        close(computed?.points.re ?? [], served.points.re);
      }
    });
  }

  it('the check can fail: a content tuned by one kappa step differs from the saved version the route simulates', async () => {
    const grid = { kind: 'span', startOffsetHz: 1e9, stopOffsetHz: 3e9, points: 64 } as const;
    const served = (await noor.post(`${base}/versions/2/simulate`).send({ from: 'W11', to: 'E11', grid }).expect(200)).body as SpectrumFile;
    const circuit = content.circuits.find((c) => c.id === 'bandpass');
    const gate = circuit?.couplers[0]?.gate as string;
    const kappa = circuit?.couplers[0]?.kappa as number;
    const [tuned] = computeSpectra({ content: setCouplerKappa(content, 'bandpass', gate, Math.min(1, kappa + 0.01)), pairs: [{ from: 'W11', to: 'E11' }], grid });
    const worst = Math.max(...(tuned?.points.re ?? []).map((r, i) => Math.abs(r - (served.points.re[i] ?? 0))));
    expect(worst).toBeGreaterThan(1e-6);
  });
});
