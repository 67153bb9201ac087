// Checks a synthesise body with the contract's schema and the version's circuit ids; errors in words per field.
import { synthesiseBodySchema, type SynthesiseBody } from '@hexloom/contracts';
import { issuesToFieldErrors } from './issuesToFieldErrors.js';
import type { FieldErrors } from './specFormValues.js';

export type BodyValidation = { ok: true; body: SynthesiseBody } | { ok: false; errors: FieldErrors };

/**
 * Parses `body` with `synthesiseBodySchema` (defaults applied on success) and refuses a circuit id already used on
 * the version, or an equaliser band that does not end above its start.
 */
export function validateSynthesiseBody(body: SynthesiseBody, existingCircuitIds: readonly string[]): BodyValidation {
  const parsed = synthesiseBodySchema.safeParse(body);
  const errors: FieldErrors = parsed.success ? {} : issuesToFieldErrors(parsed.error.issues, body);
  if (errors.circuitId === undefined && existingCircuitIds.includes(body.circuitId)) {
    errors.circuitId = `This version already has a circuit called ${body.circuitId}; choose another id`;
  }
  const spec = body.spec.spec;
  if (spec.kind === 'allpass-equaliser' && !(spec.band.toHz > spec.band.fromHz) && errors['spec.spec.band.toHz'] === undefined) {
    errors['spec.spec.band.toHz'] = 'The band must end above where it starts';
  }
  if (!parsed.success || Object.keys(errors).length > 0) return { ok: false, errors };
  return { ok: true, body: parsed.data };
}
