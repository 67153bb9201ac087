// Schema issues become words under the right field, unions included, never zod's own text.
import { synthesiseBodySchema } from '@hexloom/contracts';
import { describe, expect, it } from 'vitest';
import { fieldError } from './fieldError.js';
import { issuesToFieldErrors } from './issuesToFieldErrors.js';

const errorsOf = (body: unknown) => {
  const parsed = synthesiseBodySchema.safeParse(body);
  expect(parsed.success).toBe(false);
  return parsed.success ? {} : issuesToFieldErrors(parsed.error.issues, body);
};

const notch = (spec: Record<string, unknown>, mask: unknown[] = []) => ({
  circuitId: 'n1',
  spec: { schemaVersion: 1, name: 'Notch', spec: { kind: 'ring-notch', from: 'W03', to: 'E03', centreOffsetHz: 3e9, target: { critical: true }, ring: { free: true }, ...spec }, mask: { regions: mask } },
});

describe('issuesToFieldErrors', () => {
  it('finds the chosen branch of a union: a ring perimeter that is not a whole number', () => {
    expect(errorsOf(notch({ ring: { perimeterUnits: 7.5 } }))).toEqual({ 'spec.spec.ring.perimeterUnits': 'Enter a whole number' });
  });

  it('writes limits in the typed unit: a frequency minimum in GHz, a ripple maximum in dB', () => {
    const errors = errorsOf(notch({ ring: { fsrHz: -1 } }));
    expect(errors['spec.spec.ring.fsrHz']).toBe('Must be above 0 GHz');
    const band = errorsOf({ ...notch({}), spec: { ...notch({}).spec, spec: { kind: 'coupled-ring-bandpass', from: 'W11', to: 'E11', through: 'W14', response: 'chebyshev', order: 9, rippleDb: 4, bandwidthHz: 1e9, centreOffsetHz: 0 } } });
    expect(band['spec.spec.order']).toBe('Must be at most 8');
    expect(band['spec.spec.rippleDb']).toBe('Must be at most 3 dB');
  });

  it('names the list item at fault and finds it from the list field', () => {
    const body = { ...notch({}), spec: { ...notch({}).spec, spec: { kind: 'transversal', from: 'W07', to: 'E07', taps: [1, Number.NaN], tapDelayUnits: 2 } } };
    const errors = errorsOf(body);
    expect(fieldError(errors, 'spec.spec.taps')).toBe('Tap 2: enter a number');
  });

  it('words a mask band that ends below its start and an empty port', () => {
    const errors = errorsOf(notch({ to: '' }, [{ kind: 'stop', range: { fromHz: 2e9, toHz: 1e9 }, minRejectionDb: 10 }]));
    expect(errors['spec.mask.regions.0.range.toHz']).toBe('The band must end above where it starts');
    expect(errors['spec.spec.to']).toBe('Choose a port');
    expect(Object.values(errors).join(' ')).not.toMatch(/expected|received|Invalid input/);
  });
});
