// Why a synthesis was refused, in words, from the server's stable reason.

const REASONS: Record<string, string> = {
  'impossible-design': 'The request cannot be designed with this chip’s technology',
  'invalid-mask': 'The mask does not fit this circuit',
  'delay-set-unrealisable': 'These delays cannot all be realised on these outputs',
  'not-enough-free-area': 'There is not enough free area on the chip',
  'unknown-port': 'A port is not on this chip',
  'port-taken': 'A port is already used by another circuit',
  'wrong-parity': 'No path of that length exists between these ports',
  'too-short': 'The ports are further apart than the length asked for',
  'no-free-path': 'No free path joins these ports',
  'dead-gates-in-the-way': 'Dead gates block every route',
  'search-limit': 'The router gave up before finding a route',
  'invalid-request': 'The request is not valid for this chip',
  'duplicate-circuit': 'A circuit with this id already exists',
  'unknown-circuit': 'The circuit is not on this version',
};

/** A sentence for `reason`; an unknown reason is written out from its words ("some-reason" -> "Some reason"). */
export function describeReason(reason: string): string {
  const known = REASONS[reason];
  if (known) return known;
  const words = reason.replace(/[-_]+/g, ' ').trim();
  return words ? `${words.charAt(0).toUpperCase()}${words.slice(1)}` : 'The synthesis was refused';
}
