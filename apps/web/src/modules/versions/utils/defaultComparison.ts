// Which two versions the Versions tab compares before the user picks: the one before the shown version, and it.
import type { VersionSummary } from '@hexloom/contracts';

/** A = the newest version older than `current` (else the next newer one), B = `current`; undefined when there is no pair. */
export function defaultComparison(versions: readonly Pick<VersionSummary, 'number'>[], current: number): { a: number | undefined; b: number | undefined } {
  const numbers = versions.map((v) => v.number).sort((x, y) => x - y);
  if (!numbers.includes(current)) return { a: numbers.at(-2), b: numbers.at(-1) };
  const older = numbers.filter((n) => n < current).at(-1);
  const newer = numbers.find((n) => n > current);
  if (older !== undefined) return { a: older, b: current };
  return newer !== undefined ? { a: current, b: newer } : { a: undefined, b: undefined };
}
