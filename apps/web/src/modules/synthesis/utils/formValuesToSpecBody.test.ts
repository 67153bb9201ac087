// Spec -> form values -> spec is the identity for every default spec, and form text is read in the units it names.
import { filterSpecBodySchema, type FilterSpecKind } from '@hexloom/contracts';
import { describe, expect, it } from 'vitest';
import { DEFAULT_SPECS } from './defaultSpecs.js';
import { formValuesToSpecBody } from './formValuesToSpecBody.js';
import { maskRowsToMask } from './maskRowsToMask.js';
import { maskToMaskRows } from './maskToMaskRows.js';
import type { RingNotchValues } from './specFormValues.js';
import { specToFormValues } from './specToFormValues.js';

const sameRef = (ref: string) => ref;

describe('formValuesToSpecBody', () => {
  for (const kind of Object.keys(DEFAULT_SPECS) as FilterSpecKind[]) {
    it(`gives back the ${kind} default spec and mask from its own form values`, () => {
      const spec = DEFAULT_SPECS[kind];
      expect(formValuesToSpecBody(specToFormValues(spec.spec, sameRef))).toEqual(spec.spec);
      expect(maskRowsToMask(maskToMaskRows(spec.mask))).toEqual(spec.mask);
      expect(filterSpecBodySchema.safeParse(spec.spec).success).toBe(true);
    });
  }

  it('reads GHz text as Hz and leaves blank optional fields out (1 GHz = 1e9 Hz, SI prefix, common practice)', () => {
    const values = specToFormValues(DEFAULT_SPECS['ring-notch'].spec, sameRef) as RingNotchValues;
    const body = formValuesToSpecBody({ ...values, centreOffsetGHz: '2', targetMode: 'fwhm', fwhmGHz: '0.25', widthTolerancePercent: '', ringMode: 'fsr', fsrGHz: '18.3' });
    expect(body).toEqual({ kind: 'ring-notch', from: 'W03', to: 'E03', centreOffsetHz: 2e9, target: { fwhmHz: 0.25e9 }, ring: { fsrHz: 18.3e9 } });
  });

  it('turns blank required numbers into NaN so the schema refuses them', () => {
    const values = specToFormValues(DEFAULT_SPECS['ring-notch'].spec, sameRef) as RingNotchValues;
    const body = formValuesToSpecBody({ ...values, centreOffsetGHz: '  ' });
    expect(body.kind === 'ring-notch' && Number.isNaN(body.centreOffsetHz)).toBe(true);
    expect(filterSpecBodySchema.safeParse(body).success).toBe(false);
  });
});
