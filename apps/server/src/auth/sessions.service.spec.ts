import { describe, expect, it } from 'vitest';
import { hashSessionToken } from './sessions.service.js';

describe('hashSessionToken', () => {
  it('is the sha-256 hex digest of the token', () => {
    // FIPS 180-2, Appendix B.1: SHA-256("abc").
    expect(hashSessionToken('abc')).toBe('ba7816bf8f01cfea414140de5dae2223b00361a396177a9cb410ff61f20015ad');
    // FIPS 180-2, Appendix B.2: the 448-bit two-block message.
    expect(hashSessionToken('abcdbcdecdefdefgefghfghighijhijkijkljklmklmnlmnomnopnopq')).toBe(
      '248d6a61d20638b8e5c026930c3e6039a33ce45964ff2167f6ecedd419db06c1',
    );
  });
});
