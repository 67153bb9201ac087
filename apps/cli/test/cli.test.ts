import { execFileSync } from 'node:child_process';
import { fileURLToPath } from 'node:url';
import { describe, expect, it, vi } from 'vitest';
import { HEXLOOM_VERSION } from '@hexloom/contracts';

// Each call starts a fresh process that loads the TypeScript sources through tsx: seconds on a loaded machine.
vi.setConfig({ testTimeout: 30_000 });

const repoRoot = fileURLToPath(new URL('../../../', import.meta.url));
const run = (...args: string[]): string =>
  execFileSync('npx', ['--no-install', 'hexloom', ...args], { cwd: repoRoot, encoding: 'utf8' });

describe('hexloom command', () => {
  it('prints its version through npx from the repository root', () => {
    expect(run('version').trim()).toBe(`hexloom ${HEXLOOM_VERSION}`);
  });
  it('prints JSON with --json', () => {
    expect(JSON.parse(run('version', '--json'))).toMatchObject({ hexloom: HEXLOOM_VERSION });
  });
  it('lists its commands in --help', () => {
    expect(run('--help')).toContain('version');
  });
});
