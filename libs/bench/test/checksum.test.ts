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

describe('canonicalJson against RFC 8785', () => {
  it('writes numbers as the RFC 8785 appendix B table does', () => {
    // RFC 8785, Appendix B (IEEE 754 bit pattern -> JSON text), from memory.
    const table: [string, string][] = [
      ['0000000000000000', '0'], ['8000000000000000', '0'], ['0000000000000001', '5e-324'], ['8000000000000001', '-5e-324'],
      ['7fefffffffffffff', '1.7976931348623157e+308'], ['ffefffffffffffff', '-1.7976931348623157e+308'], ['4340000000000000', '9007199254740992'],
      ['c340000000000000', '-9007199254740992'], ['4430000000000000', '295147905179352830000'], ['44b52d02c7e14af5', '9.999999999999997e+22'],
      ['44b52d02c7e14af6', '1e+23'], ['44b52d02c7e14af7', '1.0000000000000001e+23'], ['444b1ae4d6e2ef4e', '999999999999999700000'],
      ['444b1ae4d6e2ef4f', '999999999999999900000'], ['444b1ae4d6e2ef50', '1e+21'], ['3eb0c6f7a0b5ed8c', '9.999999999999997e-7'],
      ['3eb0c6f7a0b5ed8d', '0.000001'], ['41b3de4355555553', '333333333.3333332'], ['41b3de4355555554', '333333333.33333325'],
      ['41b3de4355555555', '333333333.3333333'], ['41b3de4355555556', '333333333.3333334'], ['41b3de4355555557', '333333333.33333343'],
      ['becbf647612f3696', '-0.0000033333333333333333'], ['43143ff3c1cb0959', '1424953923781206.2'],
    ];
    for (const [bits, text] of table) {
      const x = new DataView(Uint8Array.from(bits.match(/../g)!.map((h) => parseInt(h, 16))).buffer).getFloat64(0);
      expect(canonicalJson(x), bits).toBe(text);
    }
  });

  it('sorts member names by UTF-16 code units and escapes strings as RFC 8785 section 3.2.2.2 says', () => {
    // RFC 8785 sec. 3.2.3 example of sorting: "\u20ac" (euro), "\r", "\ufb33", "1", "\ud83d\ude00", "\u0080", "\u00f6".
    const sut = canonicalJson({ '\u20ac': 'Euro Sign', '\r': 'Carriage Return', '\ufb33': 'Hebrew Letter Dalet With Dagesh', '1': 'One', '\ud83d\ude00': 'Emoji: Grinning Face', '\u0080': 'Control', '\u00f6': 'Latin Small Letter O With Diaeresis' });
    expect(sut).toBe('{"\\r":"Carriage Return","1":"One","\u0080":"Control","\u00f6":"Latin Small Letter O With Diaeresis","\u20ac":"Euro Sign","\ud83d\ude00":"Emoji: Grinning Face","\ufb33":"Hebrew Letter Dalet With Dagesh"}');
  });

  it('refuses a number JSON cannot hold', () => {
    expect(() => canonicalJson({ a: Number.NaN })).toThrow(/no form for the number NaN/);
  });

  it('gives the same text as an independent Python implementation of RFC 8785 on a bench export', async () => {
    const { execFileSync } = await import('node:child_process');
    const data = { schemaVersion: 1, chip: 'Kestrel Vale ground-terminal mesh (demo) \u00e9\u20ac\ud83d\ude00', gates: [{ gate: 'g(0,1)e', kappa: 0.123456789012345, phaseRad: -3.14159e-7 }], totalPowerW: 1.5e21, z: [1e-7, 100, 0.1 + 0.2], '\u00f6': true, A: null };
    // Python (Debian python3): member names sorted by UTF-16 code units, ECMAScript number form (RFC 8785 sec. 3.2.2.3).
    const script = String.raw`
import json, sys, math
def num(x):
    if x == 0: return '0'
    s = repr(abs(x))
    mant, _, ex = s.partition('e')
    ip, _, fp = mant.partition('.')
    # Shortest round-trip digits ds and decimal exponent n with value = 0.ds x 10^n (repr gives the digits).
    ds = (ip + fp).lstrip('0').rstrip('0') or '0'
    n = (len(ip.lstrip('0')) if ip.lstrip('0') else -(len(fp) - len(fp.lstrip('0')))) + (int(ex) if ex else 0)
    k = len(ds)
    sign = '-' if x < 0 else ''
    if k <= n <= 21: return sign + ds + '0' * (n - k)
    if 0 < n <= 21: return sign + ds[:n] + '.' + ds[n:]
    if -6 < n <= 0: return sign + '0.' + '0' * (-n) + ds
    e = n - 1
    return sign + ds[0] + ('.' + ds[1:] if k > 1 else '') + 'e' + ('+' if e > 0 else '-') + str(abs(e))
def canon(v):
    if v is None or isinstance(v, bool): return json.dumps(v)
    if isinstance(v, (int, float)): return num(float(v))
    if isinstance(v, str): return json.dumps(v, ensure_ascii=False)
    if isinstance(v, list): return '[' + ','.join(canon(x) for x in v) + ']'
    keys = sorted(v.keys(), key=lambda k: k.encode('utf-16-be'))
    return '{' + ','.join(json.dumps(k, ensure_ascii=False) + ':' + canon(v[k]) for k in keys) + '}'
sys.stdout.buffer.write(canon(json.load(sys.stdin)).encode('utf-8'))
`;
    const python = execFileSync('/usr/bin/python3', ['-c', script], { input: JSON.stringify(data), encoding: 'utf8' });
    expect(canonicalJson(data)).toBe(python);
  });
});
