// Kill cycles: the built server is killed with SIGKILL in the middle of saves and uploads, again and again, on one
// store (a data folder, or a PostgreSQL database when `env` carries DATABASE_URL); after the last restart the caller
// checks that each acknowledged write is there and nothing half-written is.
import { expect } from 'vitest';
import { signInOverHttp } from './http-session.js';
import { startServer, type RunningServer } from './start-server.js';

export type Ack = { kind: 'version'; number: number; note: string } | { kind: 'measurement'; label: string };

export type KillCycleResult = {
  acks: Ack[];
  killedWhileWriting: number;
  /** What the restarted server holds. */
  versions: { number: number; note: string }[];
  headVersion: number;
  measuredLabels: string[];
};

const TECHNOLOGY = {
  unitLengthUm: 650,
  groupIndex: 4.2,
  referenceFrequencyHz: 193.4e12,
  lossPerGateDb: 0.25,
  bendLossDb: 0,
  extinctionDb: 25,
  phaseShifter: { piPowerW: 0.022, resistanceOhm: 1200, maxPowerW: 0.06, maxVoltageV: 9 },
};

/** Runs `cycles` start / write / SIGKILL cycles on one store, then starts once more and reads everything back. */
export async function runKillCycles(cycles: number, store: { dataDir: string; env?: Record<string, string> }): Promise<KillCycleResult> {
  const env = { HEXLOOM_SEED_DEMO_DESIGNS: 'false', ...store.env };
  const acks: Ack[] = [];
  let base = '';
  let measurementsPath = '';
  let ports: string[] = [];
  let killedWhileWriting = 0;
  let server: RunningServer | undefined;
  try {
    for (let cycle = 0; cycle < cycles; cycle++) {
      server = await startServer({ dataDir: store.dataDir, env });
      const noor = await signInOverHttp(server.url, 'noor');
      if (cycle === 0) {
        const teams = (await noor.json('GET', '/api/teams')).body as unknown as { id: string }[];
        const teamId = teams[0]!.id;
        const chip = (await noor.json('POST', `/api/teams/${teamId}/chips`, { name: 'faults chip', template: { rows: 2, columns: 3 }, technology: TECHNOLOGY })).body as unknown as { id: string; definition: { ports: { id: string }[] } };
        ports = [chip.definition.ports[0]!.id, chip.definition.ports[chip.definition.ports.length - 1]!.id];
        const created = (await noor.json('POST', `/api/teams/${teamId}/chips/${chip.id}/configurations`, { name: 'faults' })).body as unknown as { id: string };
        base = `/api/teams/${teamId}/configurations/${created.id}`;
        measurementsPath = `${base}/versions/1/measurements`;
      }
      // Writes in a loop until the kill lands; every 201 is an acknowledged write.
      const v1 = (await noor.json('GET', `${base}/versions/1`)).body as unknown as { content: unknown };
      let writing = true;
      const writer = (async () => {
        for (let k = 0; writing; k++) {
          try {
            const detail = (await noor.json('GET', base)).body as unknown as { headVersion: number };
            const note = `cycle ${cycle} save ${k}`;
            const saved = await noor.json('POST', `${base}/versions`, { baseVersion: detail.headVersion, content: v1.content, note });
            if (saved.status === 201) acks.push({ kind: 'version', number: (saved.body as unknown as { number: number }).number, note });
            const label = `cycle ${cycle} upload ${k}`;
            const csv = `frequency_hz,amplitude_db\n193400000000000,-3\n193400001000000,-${3 + k / 100}\n`;
            const up = await noor.upload(measurementsPath, { from: ports[0]!, to: ports[1]!, label }, { name: 'm.csv', text: csv });
            if (up.status === 201) acks.push({ kind: 'measurement', label });
          } catch {
            return; // the connection died with the server
          }
        }
      })();
      await new Promise((r) => setTimeout(r, 400 + 150 * cycle));
      killedWhileWriting += 1;
      await server.kill();
      writing = false;
      await writer;
    }
    server = await startServer({ dataDir: store.dataDir, env });
    const noor = await signInOverHttp(server.url, 'noor');
    const detail = (await noor.json('GET', base)).body as unknown as { headVersion: number; versions: { number: number; note: string }[] };
    const measured = (await noor.json('GET', measurementsPath)).body as unknown as { label: string }[];
    return { acks, killedWhileWriting, versions: detail.versions, headVersion: detail.headVersion, measuredLabels: measured.map((m) => m.label) };
  } finally {
    await server?.kill();
  }
}

/** Every acknowledged write survived and nothing is half-written; returns one line for the log. */
export function expectNothingLost(label: string, cycles: number, result: KillCycleResult): string {
  for (const a of result.acks) {
    if (a.kind === 'version') expect(result.versions.find((v) => v.number === a.number)?.note, a.note).toBe(a.note);
    else expect(result.measuredLabels).toContain(a.label);
  }
  // Nothing half-written: versions 1..head with no gap, and the head is the newest one.
  expect(result.versions.map((v) => v.number).sort((x, y) => x - y)).toEqual(Array.from({ length: result.headVersion }, (_, i) => i + 1));
  const saves = result.acks.filter((a) => a.kind === 'version').length;
  expect(saves).toBeGreaterThan(cycles);
  expect(result.killedWhileWriting).toBe(cycles);
  return `faults (${label}): ${cycles} SIGKILL cycles, ${result.acks.length} acknowledged writes (${saves} saves, ${result.acks.length - saves} uploads), 0 lost\n`;
}
