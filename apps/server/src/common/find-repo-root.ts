/** Locates the monorepo root, so paths work from both src/ (tests) and dist/ (built server). */
import { existsSync, readFileSync } from 'node:fs';
import { dirname, join } from 'node:path';

/**
 * Walks up from `startDir` to the folder whose package.json is named `hexloom`.
 * @throws Error when no such folder exists above `startDir`.
 */
export function findRepoRoot(startDir: string = import.meta.dirname): string {
  let dir = startDir;
  for (;;) {
    const manifest = join(dir, 'package.json');
    if (existsSync(manifest)) {
      const parsed = JSON.parse(readFileSync(manifest, 'utf8')) as { name?: unknown };
      if (parsed.name === 'hexloom') return dir;
    }
    const parent = dirname(dir);
    if (parent === dir) throw new Error(`findRepoRoot: no hexloom package.json above "${startDir}"`);
    dir = parent;
  }
}
