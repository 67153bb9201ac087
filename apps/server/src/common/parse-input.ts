/** Parses one request input against a zod schema or throws RequestValidationError. */
import type { z } from 'zod';
import { type InputLocation, RequestValidationError } from './request-validation.error.js';
import { findUnsafeText } from './unsafe-text.js';

/**
 * Returns the parsed (and transformed) value, or throws a 400-mapped error listing the issues. Text with a NUL or a
 * lone surrogate, and values nested too deep, are refused first, naming the field.
 */
export function parseInput<S extends z.ZodType>(schema: S, value: unknown, location: InputLocation): z.output<S> {
  const unsafe = findUnsafeText(value);
  if (unsafe) throw new RequestValidationError(location, [{ path: unsafe.path || location, message: unsafe.reason }]);
  const result = schema.safeParse(value);
  if (!result.success) throw RequestValidationError.fromZod(location, result.error);
  return result.data;
}
