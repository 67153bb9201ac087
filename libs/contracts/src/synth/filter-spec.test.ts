import { describe, expect, it } from 'vitest';
import { filterSpecSchema } from '../index.js';

describe('filterSpecSchema', () => {
  it('reads a Chebyshev coupled-ring band-pass with its mask', () => {
    const spec = filterSpecSchema.parse({
      schemaVersion: 1,
      name: 'Ku-band channel',
      spec: { kind: 'coupled-ring-bandpass', from: 'v(0,0)n/g(0,0)ne', to: 'v(3,0)n/g(3,0)ne', through: 'v(4,0)n/g(4,0)ne', response: 'chebyshev', order: 3, rippleDb: 0.1, bandwidthHz: 1.2e9, centreOffsetHz: 8e9 },
      mask: { regions: [{ kind: 'stop', range: { fromHz: 10e9, toHz: 12e9 }, minRejectionDb: 30 }] },
    });
    expect(spec.spec.kind).toBe('coupled-ring-bandpass');
    expect(spec.mask.regions).toHaveLength(1);
  });
  it('rejects an odd lattice arm difference and names the field', () => {
    const result = filterSpecSchema.safeParse({
      schemaVersion: 1,
      name: 'x',
      spec: { kind: 'mzi-lattice', from: 'v(0,0)n/g(0,0)ne', to: 'v(1,0)n/g(1,0)ne', band: 'half-band', order: 4, armDifferenceUnits: 3 },
    });
    expect(result.success).toBe(false);
    expect(result.error?.issues[0]?.path).toEqual(['spec', 'armDifferenceUnits']);
  });
  it('rejects a mask range that ends before it starts', () => {
    const result = filterSpecSchema.safeParse({
      schemaVersion: 1,
      name: 'x',
      spec: { kind: 'delay-line', from: 'v(0,0)n/g(0,0)ne', to: 'v(1,0)n/g(1,0)ne', delay: { ps: 100 } },
      mask: { regions: [{ kind: 'pass', range: { fromHz: 5, toHz: 1 } }] },
    });
    expect(result.success).toBe(false);
  });
});
