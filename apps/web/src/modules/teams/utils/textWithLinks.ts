// Splits plain mail text into text and web links, so links can be made clickable without rendering any HTML.

/** A run of plain text, or an http(s) link. */
export type TextPart = { kind: 'text'; text: string } | { kind: 'link'; href: string };

const URL_PATTERN = /https?:\/\/[^\s<>"')\]]+/g;

/** "Open https://x.example/a." -> text "Open ", link "https://x.example/a", text "." (a trailing full stop or comma is not part of a link). */
export function textWithLinks(text: string): TextPart[] {
  const parts: TextPart[] = [];
  let last = 0;
  for (const match of text.matchAll(URL_PATTERN)) {
    const href = match[0].replace(/[.,;:!?]+$/, '');
    const at = match.index ?? 0;
    if (at > last) parts.push({ kind: 'text', text: text.slice(last, at) });
    parts.push({ kind: 'link', href });
    last = at + href.length;
  }
  if (last < text.length) parts.push({ kind: 'text', text: text.slice(last) });
  return parts;
}
