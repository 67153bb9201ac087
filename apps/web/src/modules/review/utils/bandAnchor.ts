// A frequency band typed in GHz (offsets from the reference frequency) as a comment anchor in Hz.
import type { CommentAnchor } from '@hexloom/contracts';

/** The anchor, or a sentence saying what is wrong with the typed values. */
export type BandAnchorResult = { ok: true; anchor: CommentAnchor } | { ok: false; message: string };

/** Parses "from" and "to" in GHz (a comma is read as a decimal point); `to` must not be below `from`. */
export function bandAnchor(fromGhz: string, toGhz: string): BandAnchorResult {
  const read = (text: string): number => (text.trim() === '' ? Number.NaN : Number(text.trim().replace(',', '.')));
  const from = read(fromGhz);
  const to = read(toGhz);
  if (!Number.isFinite(from)) return { ok: false, message: 'Type where the band starts, in GHz from the reference frequency' };
  if (!Number.isFinite(to)) return { ok: false, message: 'Type where the band ends, in GHz from the reference frequency' };
  if (to < from) return { ok: false, message: 'The band must end at or above where it starts' };
  return { ok: true, anchor: { fromHz: from * 1e9, toHz: to * 1e9 } };
}
