// Shades for the response plot: the frequency bands that open comment threads point at.
import type { Comment } from '@hexloom/contracts';
import { commentThreads } from './commentThreads.js';

/** One band to shade, as offsets from the reference frequency (Hz), with the comment that names it. */
export type BandShade = { fromHz: number; toHz: number; commentId: string };

/**
 * Bands of the comments anchored to a frequency range, oldest comment first (pure). Comments of resolved threads are
 * left out: a resolved discussion no longer needs the reader's eye on the plot.
 */
export function bandShades(comments: readonly Comment[]): BandShade[] {
  const shades: BandShade[] = [];
  for (const thread of commentThreads(comments)) {
    if (thread.root.resolvedAt !== null) continue;
    for (const c of [thread.root, ...thread.replies]) {
      if (c.anchor && 'fromHz' in c.anchor) shades.push({ fromHz: c.anchor.fromHz, toHz: c.anchor.toHz, commentId: c.id });
    }
  }
  return shades.sort((a, b) => {
    const ca = comments.findIndex((c) => c.id === a.commentId);
    const cb = comments.findIndex((c) => c.id === b.commentId);
    return ca - cb;
  });
}
