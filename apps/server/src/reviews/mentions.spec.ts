import { describe, expect, it } from 'vitest';
import { mentionedLogins } from './mentions.js';

describe('mentionedLogins', () => {
  it('finds each @login once, in order, and drops a trailing full stop', () => {
    expect(mentionedLogins('@caspar please check, cc @wen and @caspar again. Thanks @noor.')).toEqual(['caspar', 'wen', 'noor']);
  });

  it('ignores e-mail addresses and a lone @', () => {
    expect(mentionedLogins('mail ilse@kestrel-vale.example or @ alone')).toEqual([]);
  });
});
