// gatePins and bandShades: the canvas pins and plot shades drawn from a version's comments.
import type { Comment } from '@hexloom/contracts';
import { describe, expect, it } from 'vitest';
import { bandShades } from './bandShades.js';
import { gatePins } from './gatePins.js';

const id = (n: number): string => `00000000-0000-4000-8000-${String(n).padStart(12, '0')}`;
const comment = (n: number, over: Partial<Comment> = {}): Comment => ({
  id: id(n),
  versionNumber: 3,
  parentId: null,
  author: 'noor',
  body: `comment ${n}`,
  anchor: null,
  mentions: [],
  createdAt: `2026-12-0${n}T10:00:00.000Z`,
  resolvedAt: null,
  resolvedBy: null,
  ...over,
});

// A fixed fixture: two threads on gate g(1,0)e (one resolved), one on g(0,0)ne, two bands (one in a resolved thread).
const COMMENTS: Comment[] = [
  comment(1, { anchor: { gate: 'g(1,0)e' } }),
  comment(2, { anchor: { gate: 'g(1,0)e' }, resolvedAt: '2026-12-03T17:04:00.000Z', resolvedBy: 'caspar' }),
  comment(3, { parentId: id(2), anchor: { gate: 'g(0,0)ne' } }),
  comment(4, { anchor: { fromHz: 1.9e9, toHz: 2.1e9 } }),
  comment(5, { parentId: id(2), anchor: { fromHz: -5e8, toHz: 5e8 } }),
  comment(6, { parentId: id(4), anchor: { fromHz: 3e9, toHz: 3e9 } }),
];

describe('gatePins', () => {
  it('counts the comments on each gate and calls a gate resolved only when all its threads are', () => {
    expect(gatePins(COMMENTS)).toEqual([
      { gateId: 'g(0,0)ne', count: 1, resolved: true },
      { gateId: 'g(1,0)e', count: 2, resolved: false },
    ]);
  });

  it('gives no pins for comments without a gate, nor for no comments', () => {
    expect(gatePins([comment(1), comment(2, { anchor: { fromHz: 0, toHz: 1 } })])).toEqual([]);
    expect(gatePins([])).toEqual([]);
  });

  it('marks a pin resolved when its only thread is resolved, replies included', () => {
    const resolvedRoot = comment(1, { anchor: { gate: 'g(2,0)e' }, resolvedAt: '2026-12-03T17:04:00.000Z', resolvedBy: 'wen' });
    expect(gatePins([resolvedRoot, comment(2, { parentId: id(1), anchor: { gate: 'g(2,0)e' } })])).toEqual([{ gateId: 'g(2,0)e', count: 2, resolved: true }]);
  });
});

describe('bandShades', () => {
  it('shades the bands of open threads, oldest comment first, with the comment that names each', () => {
    expect(bandShades(COMMENTS)).toEqual([
      { fromHz: 1.9e9, toHz: 2.1e9, commentId: id(4) },
      { fromHz: 3e9, toHz: 3e9, commentId: id(6) },
    ]);
  });

  it('leaves out bands of resolved threads and gives nothing for gate-only comments', () => {
    expect(bandShades([comment(1, { anchor: { gate: 'g(1,0)e' } })])).toEqual([]);
    expect(bandShades([comment(1, { anchor: { fromHz: 0, toHz: 1 }, resolvedAt: '2026-12-03T17:04:00.000Z', resolvedBy: 'wen' })])).toEqual([]);
  });
});
