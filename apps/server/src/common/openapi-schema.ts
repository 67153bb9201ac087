/** Turns zod contract schemas into OpenAPI schema objects for @nestjs/swagger decorators. */
import type { SchemaObject } from '@nestjs/swagger';
import { z } from 'zod';

/** OpenAPI 3.0 schema of `schema`; `io: 'input'` for request bodies (before transforms). */
export function openApiSchema(schema: z.ZodType, io: 'input' | 'output' = 'output'): SchemaObject {
  const json = z.toJSONSchema(schema, { target: 'openapi-3.0', io, unrepresentable: 'any' }) as Record<string, unknown>;
  delete json['$schema'];
  return json as SchemaObject;
}
