import { describe, expect, it } from 'vitest';
import { describeForLog } from './api-exception.filter.js';

describe('describeForLog', () => {
  it('keeps the error name, the start of its message and its code frames, never the parameters a message quotes', () => {
    const huge = `Failed query: insert into "simulation_cache" ("hash", "answer") values ($1, $2)\nparams: ${'1.2345,'.repeat(200_000)}`;
    const sut = describeForLog(new Error(huge));
    expect(sut.length).toBeLessThan(3_000);
    expect(sut).toMatch(/^Error: Failed query: insert into "simulation_cache"/);
    expect(sut).not.toMatch(/params/);
    expect(sut).toMatch(/\n\s+at /);
  });
  it('says only the type of something thrown that is not an error', () => {
    expect(describeForLog({ secret: 'x' })).toBe('non-error thrown: object');
  });
});
