// The "@partial" a writer is typing at the caret.

/** The mention being typed: where its "@" sits in the text and what follows it so far. */
export type ActiveMention = { start: number; query: string };

/** The `@query` that ends at `caret` (no spaces in it, not part of an e-mail address), or null. */
export function activeMention(text: string, caret: number): ActiveMention | null {
  const before = text.slice(0, caret);
  const match = /(^|[^A-Za-z0-9_.@-])@([A-Za-z0-9_.-]*)$/.exec(before);
  if (!match) return null;
  const query = match[2] ?? '';
  return { start: before.length - query.length - 1, query };
}
