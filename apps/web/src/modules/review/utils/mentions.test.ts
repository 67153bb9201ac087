// The "@partial" at the caret, completing it, suggesting teammates, and splitting text around mentions.
import { describe, expect, it } from 'vitest';
import { activeMention } from './activeMention.js';
import { completeMention } from './completeMention.js';
import { mentionSuggestions } from './mentionSuggestions.js';
import { mentionSegments } from './mentionSegments.js';

const MEMBERS = [
  { login: 'caspar', name: 'Caspar Iyengar' },
  { login: 'carmen', name: 'Carmen Ode' },
  { login: 'wen', name: 'Wen Lathrop' },
];

describe('activeMention', () => {
  it('finds the @partial that ends at the caret', () => {
    expect(activeMention('please check @ca', 16)).toEqual({ start: 13, query: 'ca' });
    expect(activeMention('@', 1)).toEqual({ start: 0, query: '' });
  });

  it('ignores e-mail addresses and a finished mention followed by a space', () => {
    expect(activeMention('mail ilse@kes', 13)).toBeNull();
    expect(activeMention('@caspar ok', 10)).toBeNull();
  });
});

describe('completeMention', () => {
  it('replaces the partial, and the rest of the word under the caret, with @login and a space', () => {
    expect(completeMention('hi @ca there', 6, { start: 3, query: 'ca' }, 'caspar')).toEqual({ text: 'hi @caspar there', caret: 11 });
    expect(completeMention('hi @ca', 6, { start: 3, query: 'ca' }, 'caspar')).toEqual({ text: 'hi @caspar ', caret: 11 });
  });
});

describe('mentionSuggestions', () => {
  it('suggests logins that start with the partial first, then names', () => {
    expect(mentionSuggestions(MEMBERS, 'ca').map((m) => m.login)).toEqual(['caspar', 'carmen']);
    expect(mentionSuggestions(MEMBERS, 'LATH').map((m) => m.login)).toEqual(['wen']);
    expect(mentionSuggestions(MEMBERS, 'zz')).toEqual([]);
  });
});

describe('mentionSegments', () => {
  it('marks only the logins the server listed as mentions, and keeps every character', () => {
    const body = '@caspar and @nobody: see mail ilse@kes.example. Thanks @wen.';
    const segments = mentionSegments(body, ['caspar', 'wen']);
    expect(segments.filter((s) => s.mention).map((s) => s.text)).toEqual(['@caspar', '@wen']);
    expect(segments.map((s) => s.text).join('')).toBe(body);
  });
});
