// Splits a comment's text so the teammates it mentions can be highlighted.

/** A run of plain text, or one `@login` that names a mentioned teammate. */
export type MentionSegment = { text: string; mention: string | null };

/** Segments of `body` in order; only `@login` tokens whose login is in `mentions` (from the server) are marked. */
export function mentionSegments(body: string, mentions: readonly string[]): MentionSegment[] {
  const segments: MentionSegment[] = [];
  let last = 0;
  for (const m of body.matchAll(/(^|[^A-Za-z0-9_.@-])@([A-Za-z0-9][A-Za-z0-9_.-]{0,38})/g)) {
    const login = (m[2] ?? '').replace(/\.+$/, '');
    if (!mentions.includes(login)) continue;
    const at = (m.index ?? 0) + (m[1] ?? '').length;
    if (at > last) segments.push({ text: body.slice(last, at), mention: null });
    segments.push({ text: `@${login}`, mention: login });
    last = at + login.length + 1;
  }
  if (last < body.length) segments.push({ text: body.slice(last), mention: null });
  return segments;
}
