// One server per data folder: a second one (another process) is refused with a clear message; a stale lock is taken over.
import { spawn, spawnSync } from 'node:child_process';
import { existsSync, mkdtempSync, rmSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { fileURLToPath } from 'node:url';
import { afterAll, describe, expect, it } from 'vitest';
import { DataDirLockedError, lockDataDir } from '../src/db/data-dir-lock.js';
import { openDatabase } from '../src/db/migrate.js';

const here = fileURLToPath(new URL('.', import.meta.url));
const dirs: string[] = [];
const fresh = (): string => {
  const d = mkdtempSync(join(tmpdir(), 'hexloom-lock-'));
  dirs.push(d);
  return d;
};
afterAll(() => {
  for (const d of dirs) rmSync(d, { recursive: true, force: true });
});

describe('the data folder lock', () => {
  it('refuses a second server process on the same folder, naming the holder, and lets one in after it stops', async () => {
    const dir = fresh();
    // The holder: another Node process that opens the database and waits.
    const script = `import { openDatabase } from ${JSON.stringify(join(here, '../src/db/migrate.ts'))}; const d = await openDatabase(${JSON.stringify(dir)}); console.log('open'); process.stdin.on('data', async () => { await d.close(); console.log('closed'); process.exit(0); });`;
    const holder = spawn(process.execPath, ['--import', 'tsx', '--input-type=module', '-e', script], { stdio: ['pipe', 'pipe', 'inherit'] });
    await new Promise<void>((resolve, reject) => {
      holder.stdout.on('data', (b: Buffer) => (b.toString().includes('open') ? resolve() : undefined));
      holder.on('exit', (code) => reject(new Error(`holder exited with ${code}`)));
    });
    await expect(openDatabase(dir)).rejects.toThrow(DataDirLockedError);
    await expect(openDatabase(dir)).rejects.toThrow(new RegExp(`in use by another Hexloom server \\(process ${holder.pid}\\)`));
    holder.stdin.write('stop\n');
    await new Promise<void>((resolve) => holder.on('exit', () => resolve()));
    const second = await openDatabase(dir);
    await second.close();
    expect(existsSync(join(dir, 'hexloom.lock'))).toBe(false);
  }, 60_000);

  it('takes over the lock of a process that no longer runs (a killed server)', () => {
    const dir = fresh();
    const gone = spawnSync(process.execPath, ['-e', 'process.stdout.write(String(process.pid))'], { encoding: 'utf8' });
    writeFileSync(join(dir, 'hexloom.lock'), `${gone.stdout}\n`);
    const release = lockDataDir(dir);
    expect(() => lockDataDir(dir)).toThrow(/in use by another Hexloom server/);
    release();
    lockDataDir(dir)();
  });
});
