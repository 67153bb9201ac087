// `npm run load`: the built server on loopback under several signed-in users at once (autocannon), then the event loop
// while a Monte Carlo job runs. Prints a table of throughput, latency percentiles and errors (needs `npm run build`).
import autocannon from 'autocannon';
import { signInOverHttp, type HttpSession } from '../e2e/support/http-session.js';
import { startServer } from '../e2e/support/start-server.js';

const SECONDS = Number(process.env['LOAD_SECONDS'] ?? 10);
const CONNECTIONS = Number(process.env['LOAD_CONNECTIONS'] ?? 8);

type Row = { scenario: string; requests: number; perSecond: number; p50: number; p99: number; errors: number; non2xx: string };

function run(name: string, url: string, requests: autocannon.Request[], cookies: string[], expected: number[] = [200]): Promise<Row> {
  let turn = 0;
  return new Promise((resolve, reject) => {
    const instance = autocannon(
      {
        url,
        connections: CONNECTIONS,
        duration: SECONDS,
        requests: requests.map((r) => ({
          ...r,
          setupRequest: (req: autocannon.Request) => {
            const base = r.setupRequest ? (r.setupRequest as (x: autocannon.Request) => autocannon.Request)(req) : req;
            return { ...base, headers: { ...base.headers, cookie: cookies[turn++ % cookies.length] as string, origin: url, 'content-type': 'application/json' } };
          },
        })),
      },
      (error, result) => {
        if (error) return reject(error);
        const codes = Object.entries(result.statusCodeStats ?? {}).filter(([code]) => !expected.includes(Number(code))).map(([code, s]) => `${code}: ${s.count}`);
        resolve({ scenario: name, requests: result.requests.total, perSecond: result.requests.average, p50: result.latency.p50, p99: result.latency.p99, errors: result.errors + result.timeouts + (result['5xx'] ?? 0), non2xx: codes.join(', ') || '-' });
      },
    );
    void instance;
  });
}

async function main(): Promise<void> {
  const server = await startServer({ env: { HEXLOOM_RATE_COMPUTE_PER_MINUTE: '1000000', HEXLOOM_RATE_SIGN_IN_PER_MINUTE: '1000000' } });
  try {
    const users: HttpSession[] = [];
    for (const login of ['noor', 'tobin', 'ilse', 'caspar']) users.push(await signInOverHttp(server.url, login));
    const noor = users[0] as HttpSession;
    const teams = (await noor.json('GET', '/api/teams')).body as unknown as { id: string }[];
    const teamId = (teams[0] as { id: string }).id;
    const chips = (await noor.json('GET', `/api/teams/${teamId}/chips`)).body as unknown as { id: string; definition: { ports: { id: string; label?: string }[] } }[];
    const chip = chips.find((c) => c.definition.ports.some((p) => p.label === 'W03')) as (typeof chips)[number];
    const list = (await noor.json('GET', `/api/teams/${teamId}/chips/${chip.id}/configurations`)).body as unknown as { id: string; name: string }[];
    const notch = list.find((c) => c.name === 'Interferer notch') as { id: string };
    const base = `/api/teams/${teamId}/configurations/${notch.id}`;
    // A scratch configuration for the saves, so the demo designs stay as they are.
    const scratch = (await noor.json('POST', `/api/teams/${teamId}/chips/${chip.id}/configurations`, { name: 'load scratch' })).body as unknown as { id: string };
    const scratchBase = `/api/teams/${teamId}/configurations/${scratch.id}`;
    const v1 = (await noor.json('GET', `${scratchBase}/versions/1`)).body as unknown as { content: unknown };
    const cookies = users.map((u) => u.cookie());
    const simulate = (points: () => number): autocannon.Request => ({ method: 'POST', path: `${base}/versions/2/simulate`, setupRequest: (req) => ({ ...req, body: JSON.stringify({ from: 'W03', to: 'E03', grid: { kind: 'fsr', points: points() } }) }) });
    let fresh = 0;
    let head = 1;
    const rows: Row[] = [];
    rows.push(await run('reads (configuration, version)', server.url, [{ method: 'GET', path: base }, { method: 'GET', path: `${base}/versions/2` }], cookies));
    rows.push(await run('simulate, cached (1,024 points)', server.url, [simulate(() => 1024)], cookies));
    rows.push(await run('simulate, uncached (a new grid each time)', server.url, [simulate(() => 2048 + fresh++)], cookies));
    // Saves based on the newest version each client has seen: the one that wins gets 201, the others a 409 with the newer one.
    const save: autocannon.Request = {
      method: 'POST',
      path: `${scratchBase}/versions`,
      setupRequest: (req) => ({ ...req, body: JSON.stringify({ baseVersion: head, content: v1.content, note: 'load' }) }),
      onResponse: (status, body) => {
        if (status === 201) head = Math.max(head, (JSON.parse(body) as { number: number }).number);
        if (status === 409) head = Math.max(head, (JSON.parse(body) as { latest: { number: number } }).latest.number);
      },
    };
    const writers = cookies.slice(0, 3); // noor and tobin design, ilse owns; caspar reviews and may not save
    rows.push(await run('saves of one configuration by 3 users (201, or 409 when stale)', server.url, [save], writers, [201, 409]));
    rows.push(await run('mixed: reads, cached simulate, saves', server.url, [{ method: 'GET', path: base }, simulate(() => 1024), save], writers, [200, 201, 409]));
    const job = await noor.json('POST', `${base}/versions/2/yield-jobs`, { from: 'W03', to: 'E03', grid: { kind: 'span', startOffsetHz: 2e9, stopOffsetHz: 4e9, points: 201 }, mask: { regions: [{ kind: 'stop', range: { fromHz: 2.98e9, toHz: 3.02e9 }, minRejectionDb: 15 }] }, runs: 20_000, seed: 1, couplerSigmaRad: 0.01, phaseSigmaRad: 0.02 });
    rows.push(await run('health while a 20,000-run Monte Carlo job runs', server.url, [{ method: 'GET', path: '/api/health' }], cookies));
    await noor.json('DELETE', `${base}/versions/2/yield-jobs/${(job.body as unknown as { id: string }).id}`);
    const line = (r: Row) => `| ${r.scenario} | ${r.requests} | ${r.perSecond.toFixed(0)} | ${r.p50} | ${r.p99} | ${r.errors} | ${r.non2xx} |`;
    process.stdout.write(`\nLoad on ${server.url}: ${CONNECTIONS} connections, ${SECONDS} s per scenario, ${users.length} signed-in users in turn (Node ${process.version}, ${new Date().toISOString().slice(0, 10)})\n\n`);
    process.stdout.write(`| scenario | requests | req/s | p50 ms | p99 ms | errors (5xx, socket, timeout) | other statuses |\n| --- | --- | --- | --- | --- | --- | --- |\n${rows.map(line).join('\n')}\n`);
    if (rows.some((r) => r.errors > 0)) process.exitCode = 1;
  } finally {
    await server.stop();
  }
}

await main();
