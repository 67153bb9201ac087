// Starts the built Hexloom server as a child process on a free port with a fresh data directory.
import { spawn, type ChildProcess } from 'node:child_process';
import { mkdtempSync, rmSync } from 'node:fs';
import { createServer } from 'node:net';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { fileURLToPath } from 'node:url';

export const REPO_ROOT = fileURLToPath(new URL('../../', import.meta.url));

export type RunningServer = { url: string; dataDir: string; logs: () => string; stop: () => Promise<void>; kill: () => Promise<void> };

/** Where to keep the data (a fresh folder by default, removed on stop) and whether to keep it after `stop`/`kill`. */
export type StartOptions = { dataDir?: string; env?: Record<string, string> };

/** Asks the OS for a free TCP port on the loopback interface. */
export async function freePort(): Promise<number> {
  return new Promise((resolve, reject) => {
    const probe = createServer();
    probe.once('error', reject);
    probe.listen(0, '127.0.0.1', () => {
      const address = probe.address();
      const port = typeof address === 'object' && address ? address.port : 0;
      probe.close(() => resolve(port));
    });
  });
}

/** Spawns `npm run serve -w apps/server` exactly as the README's start command does, and waits for its URL line. */
export async function startServer(options: StartOptions = {}): Promise<RunningServer> {
  const port = await freePort();
  const own = options.dataDir === undefined;
  const dataDir = options.dataDir ?? mkdtempSync(join(tmpdir(), 'hexloom-e2e-'));
  const child: ChildProcess = spawn('npm', ['run', 'serve', '-w', 'apps/server'], {
    cwd: REPO_ROOT,
    env: { ...process.env, PORT: String(port), HEXLOOM_DATA_DIR: dataDir, PUBLIC_URL: `http://127.0.0.1:${port}`, ...options.env },
    stdio: ['ignore', 'pipe', 'pipe'],
    detached: true,
  });
  let output = '';
  const url = await new Promise<string>((resolve, reject) => {
    const timer = setTimeout(() => reject(new Error(`server did not start within 60 s:\n${output}`)), 60_000);
    const onData = (chunk: Buffer): void => {
      output += chunk.toString();
      const match = /Hexloom is running at (\S+)/.exec(output);
      if (match?.[1]) {
        clearTimeout(timer);
        resolve(match[1]);
      }
    };
    child.stdout?.on('data', onData);
    child.stderr?.on('data', onData);
    child.once('exit', (code) => {
      clearTimeout(timer);
      reject(new Error(`server exited with code ${code}:\n${output}`));
    });
  });
  return {
    url: `http://127.0.0.1:${port}`,
    dataDir,
    logs: () => `${url}\n${output}`,
    stop: async () => {
      if (child.exitCode === null && child.pid) {
        const exited = new Promise((resolve) => child.once('exit', resolve));
        process.kill(-child.pid, 'SIGTERM');
        await exited;
      }
      if (own) rmSync(dataDir, { recursive: true, force: true });
    },
    /** SIGKILL to the whole process group: no shutdown hook runs, as when a machine loses power. */
    kill: async () => {
      if (child.exitCode === null && child.signalCode === null && child.pid) {
        const exited = new Promise((resolve) => child.once('exit', resolve));
        process.kill(-child.pid, 'SIGKILL');
        await exited;
      }
    },
  };
}
