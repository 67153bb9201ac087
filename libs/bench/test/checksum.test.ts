// SHA-256 through Web Crypto and canonical JSON, checked against the published test vectors.
import { describe, expect, it } from 'vitest';
import { canonicalJson, sha256Hex } from '../src/index.js';

describe('sha256Hex', () => {
  it('matches the FIPS 180-2 test vectors', async () => {
    // FIPS 180-2, Appendix B.1 ("abc") and the empty-message digest (NIST examples).
    expect(await sha256Hex('abc')).toBe('ba7816bf8f01cfea414140de5dae2223b00361a396177a9cb410ff61f20015ad');
    expect(await sha256Hex('')).toBe('e3b0c44298fc1c149afbf4c8996fb92427ae41e4649b934ca495991b7852b855');
  });
});

describe('canonicalJson', () => {
  it('sorts keys at every level and keeps array order, so key order does not change the text', () => {
    expect(canonicalJson({ b: 1, a: [{ d: 2, c: 3 }, 'x'] })).toBe('{"a":[{"c":3,"d":2},"x"],"b":1}');
    expect(canonicalJson({ a: 1, b: { c: 2 } })).toBe(canonicalJson({ b: { c: 2 }, a: 1 }));
  });

  it('drops undefined members like JSON.stringify does', () => {
    expect(canonicalJson({ a: undefined, b: null })).toBe('{"b":null}');
  });
});
