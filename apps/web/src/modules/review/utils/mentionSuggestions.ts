// Teammates to suggest for the "@partial" being typed.

/** Teammates whose login or name starts with `query` (case-insensitive), logins first, at most `limit`. */
export function mentionSuggestions<M extends { login: string; name: string }>(members: readonly M[], query: string, limit = 6): M[] {
  const q = query.toLowerCase();
  const byLogin = members.filter((m) => m.login.toLowerCase().startsWith(q));
  const byName = members.filter((m) => !byLogin.includes(m) && m.name.toLowerCase().split(/\s+/).some((part) => part.startsWith(q)));
  return [...byLogin, ...byName].slice(0, limit);
}
