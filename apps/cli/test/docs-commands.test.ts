// Runs every command of docs/cli.md's code blocks, in order, in a scratch directory beside the examples, as a reader would.
import { spawnSync } from 'node:child_process';
import { mkdtempSync, readFileSync, symlinkSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { fileURLToPath } from 'node:url';
import { describe, expect, it } from 'vitest';

const repoRoot = fileURLToPath(new URL('../../../', import.meta.url));
const bin = join(repoRoot, 'apps/cli/bin/hexloom.js');
const doc = readFileSync(join(repoRoot, 'docs/cli.md'), 'utf8');

/** Every `npx hexloom ...` line of the fenced code blocks, with the exit code its trailing `# exit N` comment expects (default 0). */
const commands = [...doc.matchAll(/```[a-z]*\n([\s\S]*?)```/g)]
  .flatMap((m) => (m[1] as string).split('\n'))
  .map((line) => line.trim())
  .filter((line) => line.startsWith('npx hexloom '))
  .map((line) => ({ line, exit: Number(/#\s*exit (\d+)/.exec(line)?.[1] ?? 0) }));

describe('docs/cli.md', () => {
  const dir = mkdtempSync(join(tmpdir(), 'hexloom-docs-'));
  symlinkSync(join(repoRoot, 'examples'), join(dir, 'examples'));

  it('has commands to run', () => {
    expect(commands.length).toBeGreaterThan(15);
  });

  for (const [k, { line, exit }] of commands.entries()) {
    it(`runs command ${k + 1}: ${line}`, () => {
      const run = spawnSync('bash', ['-c', line.replace(/^npx hexloom /, `"${process.execPath}" "${bin}" `)], { cwd: dir, encoding: 'utf8' });
      expect(run.status, `${run.stderr}\n${run.stdout.slice(0, 400)}`).toBe(exit);
    }, 120_000);
  }
});
