/** Finds `@login` mentions in a comment. */

/** Distinct logins mentioned as `@login` (letters, digits, dash, underscore, dot), in order of appearance. */
export function mentionedLogins(text: string): string[] {
  const found: string[] = [];
  for (const m of text.matchAll(/(^|[^A-Za-z0-9_.@-])@([A-Za-z0-9][A-Za-z0-9_.-]{0,38})/g)) {
    const login = (m[2] ?? '').replace(/\.+$/, '');
    if (login && !found.includes(login)) found.push(login);
  }
  return found;
}
