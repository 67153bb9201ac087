// A schema issue in words for the field under which it is shown ("Must be above 0 GHz", not raw zod text).
import type { synthesiseBodySchema } from '@hexloom/contracts';
import { formatNumber } from '../../figures/utils/formatFigure.js';

/** One issue of `synthesiseBodySchema.safeParse`. */
export type BodyIssue = NonNullable<ReturnType<(typeof synthesiseBodySchema)['safeParse']>['error']>['issues'][number];

/** The unit a value is typed in, from the unit in its schema name (frequencies are typed in GHz). */
function typedUnit(key: string): { unit: string; scale: number } {
  if (key === 'order' || key === 'stages') return { unit: '', scale: 1 };
  if (/PsPerGHz$/.test(key)) return { unit: ' ps/GHz', scale: 1 };
  if (/Hz$/.test(key)) return { unit: ' GHz', scale: 1e9 };
  if (/Ps$/.test(key)) return { unit: ' ps', scale: 1 };
  if (/Db$/.test(key)) return { unit: ' dB', scale: 1 };
  if (/Units$/.test(key) || key === 'units') return { unit: ' units', scale: 1 };
  if (/Percent$/.test(key)) return { unit: ' %', scale: 1 };
  if (key === 'ps') return { unit: ' ps', scale: 1 };
  return { unit: '', scale: 1 };
}

const PORT_KEYS = new Set(['from', 'to', 'through', 'drop', 'port', 'outputs']);
const LIST_WORDS: Record<string, string> = { outputs: 'outputs', taps: 'taps', coefficients: 'coefficients', regions: 'mask rows' };

/**
 * Words for `issue`; `path` is its full path in the body and `value` the value found there.
 * Limits are written in the unit the user typed (a minimum in Hz is shown in GHz).
 */
export function describeIssue(issue: BodyIssue, path: readonly PropertyKey[], value: unknown): string {
  const key = String([...path].reverse().find((p) => typeof p === 'string') ?? '');
  const isItem = typeof path[path.length - 1] === 'number';
  const { unit, scale } = typedUnit(key);
  const amount = (limit: number | bigint) => `${formatNumber(Number(limit) / scale, 6)}${unit}`;
  switch (issue.code) {
    case 'invalid_type':
      if (issue.expected === 'string') return PORT_KEYS.has(key) ? 'Choose a port' : 'Enter a value';
      if (issue.expected === 'int' && typeof value === 'number' && Number.isFinite(value)) return 'Enter a whole number';
      return 'Enter a number';
    case 'too_small':
      if (issue.origin === 'string') return PORT_KEYS.has(key) ? 'Choose a port' : key === 'name' ? 'Enter a name' : 'Enter a value';
      if (issue.origin === 'array') return `Give at least ${issue.minimum} ${LIST_WORDS[key] ?? 'items'}`;
      return issue.inclusive ? `Must be at least ${amount(issue.minimum)}` : `Must be above ${amount(issue.minimum)}`;
    case 'too_big':
      if (issue.origin === 'string') return `Use at most ${issue.maximum} characters`;
      if (issue.origin === 'array') return `Give at most ${issue.maximum} ${LIST_WORDS[key] ?? 'items'}`;
      return issue.inclusive ? `Must be at most ${amount(issue.maximum)}` : `Must be below ${amount(issue.maximum)}`;
    case 'not_multiple_of':
      return Number(issue.divisor) === 2 ? 'Must be an even number of units (the mesh is bipartite)' : `Must be a multiple of ${amount(issue.divisor)}`;
    case 'invalid_format':
      if (key === 'circuitId') return value === '' ? 'Enter a circuit id' : 'Start with a letter, then use letters, digits, _ or -';
      return 'This text is not in the expected form';
    case 'custom':
      if (key === 'toHz') return 'The band must end above where it starts';
      if (key === 'name') return 'Keep the name on one line';
      return 'This value is not accepted';
    case 'invalid_value':
      return 'Choose one of the offered values';
    default:
      return isItem ? 'This entry is not accepted' : 'This value is not accepted';
  }
}
