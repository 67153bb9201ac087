/** Parses one request input against a zod schema or throws RequestValidationError. */
import type { z } from 'zod';
import { type InputLocation, RequestValidationError } from './request-validation.error.js';

/** Returns the parsed (and transformed) value, or throws a 400-mapped error listing the issues. */
export function parseInput<S extends z.ZodType>(schema: S, value: unknown, location: InputLocation): z.output<S> {
  const result = schema.safeParse(value);
  if (!result.success) throw RequestValidationError.fromZod(location, result.error);
  return result.data;
}
