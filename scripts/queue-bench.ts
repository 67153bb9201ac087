// `npm run bench:queue`: Monte Carlo throughput of the shared yield queue with 1, 2 and 4 `hexloom worker` processes
// (one thread each) behind the built server on a PostgreSQL database. Uses DATABASE_URL (an empty database it may
// fill) or starts a throwaway cluster from Debian's postgresql. Prints a table of runs per second (needs `npm run build`).
import { type ChildProcess, spawn, spawnSync } from 'node:child_process';
import { availableParallelism, cpus } from 'node:os';
import { join } from 'node:path';
import pg from 'pg';
import { signInOverHttp } from '../e2e/support/http-session.js';
import { REPO_ROOT, freePort, startServer } from '../e2e/support/start-server.js';

const RUNS = Number(process.env['QUEUE_BENCH_RUNS'] ?? 4000);
const WORKERS = (process.env['QUEUE_BENCH_WORKERS'] ?? '1,2,4').split(',').map(Number);

/** A fresh database on DATABASE_URL's server, or on a throwaway cluster; `drop` removes what was made. */
async function benchDatabase(): Promise<{ url: string; drop: () => Promise<void> }> {
  let admin = process.env['DATABASE_URL'];
  let cluster: string | null = null;
  if (!admin) {
    cluster = `/tmp/hexloom-queue-bench-${process.pid}`;
    const started = spawnSync('bash', [join(REPO_ROOT, 'scripts/postgres-cluster.sh'), 'start', cluster, String(await freePort())], { encoding: 'utf8' });
    if (started.status !== 0) throw new Error(`could not start a PostgreSQL cluster: ${started.stderr}`);
    admin = started.stdout.trim();
  }
  const name = `hexloom_bench_${Date.now()}`;
  const client = new pg.Client({ connectionString: admin });
  await client.connect();
  await client.query(`create database ${name}`);
  await client.end();
  const url = new URL(admin);
  url.pathname = `/${name}`;
  return {
    url: url.toString(),
    drop: async () => {
      if (cluster) spawnSync('bash', [join(REPO_ROOT, 'scripts/postgres-cluster.sh'), 'stop', cluster]);
    },
  };
}

/** `hexloom worker --threads 1`, resolved once it says it is taking chunks. */
function startWorker(databaseUrl: string): Promise<ChildProcess> {
  const child = spawn(process.execPath, [join(REPO_ROOT, 'apps/cli/bin/hexloom.js'), 'worker', '--database-url', databaseUrl, '--threads', '1', '--quiet'], { stdio: ['ignore', 'ignore', 'pipe'] });
  return new Promise((resolve, reject) => {
    let log = '';
    child.stderr?.on('data', (b: Buffer) => {
      log += b.toString();
      if (log.includes('taking yield chunks')) resolve(child);
    });
    child.once('exit', (code) => reject(new Error(`hexloom worker exited with ${code}: ${log}`)));
  });
}

async function stopWorker(child: ChildProcess): Promise<void> {
  const exited = new Promise((r) => child.once('exit', r));
  child.kill('SIGINT');
  await exited;
}

const database = await benchDatabase();
const server = await startServer({ env: { DATABASE_URL: database.url, SESSION_SECRET: 'queue-bench', HEXLOOM_QUEUE_WORKER: 'false', HEXLOOM_RATE_COMPUTE_PER_MINUTE: '1000000' } });
try {
  const noor = await signInOverHttp(server.url, 'noor');
  const teams = (await noor.json('GET', '/api/teams')).body as unknown as { id: string }[];
  const teamId = (teams[0] as { id: string }).id;
  const chips = (await noor.json('GET', `/api/teams/${teamId}/chips`)).body as unknown as { id: string; definition: { ports: { label?: string }[] } }[];
  const chip = chips.find((c) => c.definition.ports.some((p) => p.label === 'W03')) as (typeof chips)[number];
  const list = (await noor.json('GET', `/api/teams/${teamId}/chips/${chip.id}/configurations`)).body as unknown as { id: string; name: string }[];
  const notch = list.find((c) => c.name === 'Interferer notch') as { id: string };
  const base = `/api/teams/${teamId}/configurations/${notch.id}/versions/2`;
  const body = { from: 'W03', to: 'E03', grid: { kind: 'span', startOffsetHz: 2e9, stopOffsetHz: 4e9, points: 201 }, mask: { regions: [{ kind: 'stop', range: { fromHz: 2.98e9, toHz: 3.02e9 }, minRejectionDb: 15 }] }, runs: RUNS, seed: 1, couplerSigmaRad: 0.01, phaseSigmaRad: 0.02 };
  const rows: { workers: number; seconds: number; runsPerSecond: number }[] = [];
  for (const n of WORKERS) {
    const workers = await Promise.all(Array.from({ length: n }, () => startWorker(database.url)));
    const started = performance.now();
    const job = (await noor.json('POST', `${base}/yield-jobs`, body)).body as unknown as { id: string; status: string };
    let status = job.status;
    while (status === 'running') {
      await new Promise((r) => setTimeout(r, 100));
      status = ((await noor.json('GET', `${base}/yield-jobs/${job.id}`)).body as unknown as { status: string }).status;
    }
    const seconds = (performance.now() - started) / 1000;
    await Promise.all(workers.map(stopWorker));
    if (status !== 'done') throw new Error(`the job with ${n} workers ended ${status}`);
    rows.push({ workers: n, seconds, runsPerSecond: RUNS / seconds });
    process.stderr.write(`${n} worker(s): ${RUNS} runs in ${seconds.toFixed(1)} s\n`);
  }
  const one = rows[0]?.runsPerSecond ?? 1;
  process.stdout.write(`\nShared yield queue: ${RUNS}-run job (201 points, demo notch), \`hexloom worker --threads 1\` processes, ${availableParallelism()} cores (${cpus()[0]?.model ?? 'unknown'}), Node ${process.version}, ${new Date().toISOString().slice(0, 10)}\n\n`);
  process.stdout.write(`| workers | seconds | runs/s | vs 1 worker |\n| --- | --- | --- | --- |\n${rows.map((r) => `| ${r.workers} | ${r.seconds.toFixed(1)} | ${r.runsPerSecond.toFixed(0)} | ${(r.runsPerSecond / one).toFixed(2)}x |`).join('\n')}\n`);
} finally {
  await server.stop();
  await database.drop();
}
