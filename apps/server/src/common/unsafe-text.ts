/** Finds text a request must not carry: a NUL character (PostgreSQL text cannot hold it) or a lone UTF-16 surrogate. */

/** A NUL, a high surrogate without its low half, or a low surrogate without its high half. */
const UNSAFE = /\u0000|[\uD800-\uDBFF](?![\uDC00-\uDFFF])|(?<![\uD800-\uDBFF])[\uDC00-\uDFFF]/;

/** Deepest nesting a request value may have (deeper JSON is refused before it is walked further). */
export const MAX_INPUT_DEPTH = 64;

/** The path (`a.b.0`) and the reason of the first unsafe string or key in `value`, or null when it is clean. */
export function findUnsafeText(value: unknown, path: string[] = [], depth = 0): { path: string; reason: string } | null {
  if (depth > MAX_INPUT_DEPTH) return { path: path.join('.'), reason: `nested deeper than ${MAX_INPUT_DEPTH} levels` };
  if (typeof value === 'string') return UNSAFE.test(value) ? { path: path.join('.'), reason: value.includes('\u0000') ? 'contains a NUL character' : 'contains a lone UTF-16 surrogate (not valid Unicode text)' } : null;
  if (Array.isArray(value)) {
    for (let i = 0; i < value.length; i++) {
      const found = findUnsafeText(value[i], [...path, String(i)], depth + 1);
      if (found) return found;
    }
    return null;
  }
  if (value !== null && typeof value === 'object') {
    for (const [k, v] of Object.entries(value)) {
      if (UNSAFE.test(k)) return { path: [...path, k].join('.'), reason: 'the key contains a NUL character or a lone surrogate' };
      const found = findUnsafeText(v, [...path, k], depth + 1);
      if (found) return found;
    }
  }
  return null;
}
