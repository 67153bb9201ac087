// The solver's CSV columns and the contracts' published header must never drift apart.
import { describe, expect, it } from 'vitest';
import { SPECTRUM_CSV_HEADER } from '../../contracts/src/index.js';
import { SPECTRUM_CSV_COLUMNS } from '../src/index.js';

describe('spectrum CSV columns', () => {
  it('are the same in the solver writer and in libs/contracts', () => {
    expect([...SPECTRUM_CSV_COLUMNS]).toEqual([...SPECTRUM_CSV_HEADER]);
  });
});
