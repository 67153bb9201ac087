/** Canonical JSON by the JSON Canonicalization Scheme (RFC 8785), so equal data hash equally in any language. */
import { BenchInputError } from './bench-input-error.js';

/**
 * RFC 8785 text of `value`: object members sorted by their names' UTF-16 code units at every level, no whitespace,
 * strings escaped as ECMAScript JSON.stringify does, numbers in ECMAScript's shortest round-trip form (RFC 8785
 * sec. 3.2.2.3; -0 is "0"); arrays keep their order and undefined members are dropped.
 * @throws BenchInputError for a number that is not finite (I-JSON has none, RFC 8785 sec. 3.2.2.3).
 */
export function canonicalJson(value: unknown): string {
  if (typeof value === 'number') {
    if (!Number.isFinite(value)) throw new BenchInputError(`bench: canonical JSON has no form for the number ${value}`);
    return JSON.stringify(value);
  }
  if (value === null || typeof value !== 'object') return JSON.stringify(value) ?? 'null';
  if (Array.isArray(value)) return `[${value.map((v) => canonicalJson(v)).join(',')}]`;
  const entries = Object.entries(value as Record<string, unknown>)
    .filter(([, v]) => v !== undefined)
    .sort(([a], [b]) => (a < b ? -1 : a > b ? 1 : 0));
  return `{${entries.map(([k, v]) => `${JSON.stringify(k)}:${canonicalJson(v)}`).join(',')}}`;
}
