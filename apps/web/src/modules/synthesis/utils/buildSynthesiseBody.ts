// The drawer's whole form -> a synthesise body, still unchecked (the schema decides what is valid).
import { SPEC_SCHEMA_VERSION, type SynthesiseBody } from '@hexloom/contracts';
import { formValuesToSpecBody } from './formValuesToSpecBody.js';
import { maskRowsToMask } from './maskRowsToMask.js';
import type { MaskRow, SpecFormValues } from './specFormValues.js';

/** Everything the drawer's form holds for one request. */
export type SynthesisFormState = { circuitId: string; name: string; values: SpecFormValues; mask: MaskRow[] };

/** POST .../synthesise body for the form, frequencies converted to Hz; not validated yet. */
export function buildSynthesiseBody(form: SynthesisFormState): SynthesiseBody {
  return {
    circuitId: form.circuitId.trim(),
    spec: { schemaVersion: SPEC_SCHEMA_VERSION, name: form.name, spec: formValuesToSpecBody(form.values), mask: maskRowsToMask(form.mask) },
  };
}
