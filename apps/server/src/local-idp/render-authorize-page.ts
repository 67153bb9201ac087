/** Server-rendered HTML of the fake identity provider's sign-in page. */
import { escapeHtml } from '../common/escape-html.js';
import type { DemoAccount } from '../db/demo-accounts.js';
import type { AuthorizeQuery } from './local-idp.schemas.js';

const STYLE = `
  :root { color-scheme: light dark; --ink: #1c2127; --paper: #f6f7f9; --card: #fff; --line: #d3d8de; --accent: #2d72d2; }
  @media (prefers-color-scheme: dark) { :root { --ink: #f6f7f9; --paper: #1c2127; --card: #252a31; --line: #404854; --accent: #4c90f0; } }
  * { box-sizing: border-box; }
  body { margin: 0; font: 15px/1.45 system-ui, sans-serif; color: var(--ink); background: var(--paper); }
  main { max-width: 34rem; margin: 3rem auto; padding: 1.5rem 2rem; background: var(--card); border: 1px solid var(--line); border-radius: 8px; }
  h1 { font-size: 1.35rem; margin: 0 0 .5rem; }
  h2 { font-size: 1rem; margin: 1.5rem 0 .5rem; }
  .note { margin: 0 0 1rem; opacity: .8; }
  .accounts { display: grid; grid-template-columns: 1fr 1fr; gap: .5rem; }
  button { font: inherit; cursor: pointer; padding: .5rem .75rem; border-radius: 6px; border: 1px solid var(--line); background: transparent; color: inherit; text-align: left; }
  button:hover, button:focus-visible { border-color: var(--accent); outline: none; }
  button small { display: block; opacity: .7; }
  label { display: block; margin: .5rem 0 .2rem; }
  input { font: inherit; width: 100%; padding: .4rem .5rem; border-radius: 6px; border: 1px solid var(--line); background: transparent; color: inherit; }
  .primary { margin-top: 1rem; background: var(--accent); border-color: var(--accent); color: #fff; text-align: center; width: 100%; }
`;

function hiddenFields(query: AuthorizeQuery): string {
  return (['client_id', 'redirect_uri', 'state'] as const)
    .map((k) => `<input type="hidden" name="${k}" value="${escapeHtml(query[k])}">`)
    .join('');
}

/** The page listing `accounts` as one-click buttons, and a form for any other account. */
export function renderAuthorizePage(query: AuthorizeQuery, accounts: readonly DemoAccount[]): string {
  const hidden = hiddenFields(query);
  const buttons = accounts
    .map(
      (a) =>
        `<button type="submit" name="login" value="${escapeHtml(a.login)}" data-testid="account-${escapeHtml(a.login)}">` +
        `${escapeHtml(a.name)}<small>${escapeHtml(a.login)} · ${escapeHtml(a.role)}</small></button>`,
    )
    .join('\n');
  return `<!doctype html>
<html lang="en">
<head>
<meta charset="utf-8">
<meta name="viewport" content="width=device-width, initial-scale=1">
<title>Hexloom local sign-in</title>
<style>${STYLE}</style>
</head>
<body>
<main>
  <h1>Hexloom local sign-in</h1>
  <p class="note">This page stands in for the code host's sign-in while Hexloom runs locally without OAuth credentials. Pick a demo account, or type any other account.</p>
  <h2>Demo accounts</h2>
  <form method="post" action="/api/local-idp/authorize" class="accounts">${hidden}
${buttons}
  </form>
  <h2>Another account</h2>
  <form method="post" action="/api/local-idp/authorize">${hidden}
    <label for="login">Login</label><input id="login" name="login" required pattern="[A-Za-z0-9][A-Za-z0-9\\-]{0,38}" autocomplete="username">
    <label for="name">Name</label><input id="name" name="name" maxlength="100" autocomplete="name">
    <label for="email">E-mail</label><input id="email" name="email" type="email" autocomplete="email">
    <button type="submit" class="primary" data-testid="account-custom-submit">Sign in</button>
  </form>
</main>
</body>
</html>`;
}
