/** Nest pipe validating a body, query or params object with a zod schema. */
import type { ArgumentMetadata, PipeTransform } from '@nestjs/common';
import type { z } from 'zod';
import { parseInput } from './parse-input.js';
import type { InputLocation } from './request-validation.error.js';

const LOCATIONS: Record<string, InputLocation> = { body: 'body', query: 'query', param: 'params' };

/** Use as `@Body(new ZodValidationPipe(schema))`; invalid input becomes a 400 with `issues`. */
export class ZodValidationPipe<S extends z.ZodType> implements PipeTransform<unknown, z.output<S>> {
  constructor(private readonly schema: S) {}

  transform(value: unknown, metadata: ArgumentMetadata): z.output<S> {
    return parseInput(this.schema, value, LOCATIONS[metadata.type] ?? 'body');
  }
}
