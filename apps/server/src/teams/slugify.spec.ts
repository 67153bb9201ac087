import { createTeamSchema } from '@hexloom/contracts';
import { describe, expect, it } from 'vitest';
import { slugify } from './slugify.js';

describe('slugify', () => {
  it('lower-cases, folds accents and joins words with single dashes', () => {
    expect(slugify('  Kestrel Vale — RF Photonics! ')).toBe('kestrel-vale-rf-photonics');
    expect(slugify('Åsa & Zoë Lab')).toBe('asa-zoe-lab');
  });
  it('pads a name with too few usable characters', () => {
    expect(slugify('!')).toBe('team-x');
    expect(slugify('Q')).toBe('team-q');
  });
  it('always yields a slug the contract accepts, even for a long name', () => {
    for (const name of ['A very long team name that goes on and on past forty characters', 'ab', '123 456', '---x---']) {
      expect(createTeamSchema.safeParse({ name: 'Ok', slug: slugify(name) }).success).toBe(true);
    }
  });
});
