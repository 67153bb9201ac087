// Completes the "@partial" being typed with a teammate's login.
import type { ActiveMention } from './activeMention.js';

/** `text` with the mention at `mention` replaced by `@login ` and the caret just after it. */
export function completeMention(text: string, caret: number, mention: ActiveMention, login: string): { text: string; caret: number } {
  const inserted = `@${login} `;
  const after = text.slice(caret).replace(/^[A-Za-z0-9_.-]*\s?/, '');
  return { text: text.slice(0, mention.start) + inserted + after, caret: mention.start + inserted.length };
}
