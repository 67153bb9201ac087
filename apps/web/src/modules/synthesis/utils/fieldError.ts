// The error to show under one field, from the errors of the whole body.
import type { FieldErrors } from './specFormValues.js';

/** The error shown under the field at `path`: its own, or the first one of a part of it (a list item, a band end). */
export function fieldError(errors: FieldErrors, path: string): string | undefined {
  return errors[path] ?? Object.entries(errors).find(([key]) => key.startsWith(`${path}.`))?.[1];
}
