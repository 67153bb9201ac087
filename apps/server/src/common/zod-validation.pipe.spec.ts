import { describe, expect, it } from 'vitest';
import { z } from 'zod';
import { RequestValidationError } from './request-validation.error.js';
import { ZodValidationPipe } from './zod-validation.pipe.js';

const schema = z.object({ name: z.string().min(2), nested: z.object({ count: z.number().int() }) });

describe('ZodValidationPipe', () => {
  const sut = new ZodValidationPipe(schema);

  it('returns the parsed value when it matches', () => {
    expect(sut.transform({ name: 'ok', nested: { count: 3 } }, { type: 'body' })).toEqual({ name: 'ok', nested: { count: 3 } });
  });

  it('throws RequestValidationError listing every offending field by dotted path', () => {
    let caught: unknown;
    try {
      sut.transform({ name: 'x', nested: { count: 1.5 } }, { type: 'body' });
    } catch (error) {
      caught = error;
    }
    expect(caught).toBeInstanceOf(RequestValidationError);
    const error = caught as RequestValidationError;
    expect(error.name).toBe('RequestValidationError');
    expect(error.kind).toBe('invalid');
    expect(error.issues?.map((i) => i.path)).toEqual(['name', 'nested.count']);
    expect(error.message).toMatch(/^Invalid body: name: /);
  });

  it('reports a non-object input under the location name', () => {
    expect(() => sut.transform(undefined, { type: 'param' })).toThrow(/^Invalid params: params: /);
  });
});
