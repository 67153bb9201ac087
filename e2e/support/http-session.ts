// A signed-in HTTP client for tests against a running server: the local sign-in flow with a cookie jar, no browser.

/** A JSON answer, read loosely by the tests. */
export type Json = Record<string, unknown> & unknown[] & string & number & null;

/** JSON requests with the session cookie of one signed-in account. */
export type HttpSession = { cookie: () => string; json: (method: string, path: string, body?: unknown) => Promise<{ status: number; body: Json }>; upload: (path: string, fields: Record<string, string>, file: { name: string; text: string }) => Promise<{ status: number; body: Json }> };

const cookiesOf = (res: Response): string[] => res.headers.getSetCookie().map((c) => c.split(';')[0] as string);

/** Signs `login` in through the server's local identity provider and returns a session. */
export async function signInOverHttp(baseUrl: string, login: string): Promise<HttpSession> {
  const jar = new Map<string, string>();
  const keep = (res: Response) => {
    for (const c of cookiesOf(res)) {
      const [k, ...v] = c.split('=');
      jar.set(k as string, v.join('='));
    }
  };
  const cookie = () => [...jar].map(([k, v]) => `${k}=${v}`).join('; ');
  const go = async (url: string, init: RequestInit = {}) => {
    const res = await fetch(new URL(url, baseUrl), { ...init, redirect: 'manual', headers: { ...(init.headers as Record<string, string>), cookie: cookie(), origin: baseUrl } });
    keep(res);
    return res;
  };
  const login1 = await go('/api/auth/login');
  const page = await go(login1.headers.get('location') as string);
  const html = await page.text();
  const hidden = (name: string) => (new RegExp(`name="${name}" value="([^"]*)"`).exec(html)?.[1] ?? '').replace(/&amp;/g, '&').replace(/&quot;/g, '"');
  const form = new URLSearchParams({ client_id: hidden('client_id'), redirect_uri: hidden('redirect_uri'), state: hidden('state'), login, name: '', email: '' });
  const authorized = await go('/api/local-idp/authorize', { method: 'POST', body: form, headers: { 'content-type': 'application/x-www-form-urlencoded' } });
  await go(authorized.headers.get('location') as string);
  return {
    cookie,
    json: async (method, path, body) => {
      const res = await go(path, { method, ...(body === undefined ? {} : { body: JSON.stringify(body), headers: { 'content-type': 'application/json' } }) });
      const text = await res.text();
      return { status: res.status, body: (text ? JSON.parse(text) : null) as Json };
    },
    upload: async (path, fields, file) => {
      const data = new FormData();
      for (const [k, v] of Object.entries(fields)) data.set(k, v);
      data.set('file', new Blob([file.text], { type: 'text/csv' }), file.name);
      const res = await go(path, { method: 'POST', body: data });
      const text = await res.text();
      return { status: res.status, body: (text ? JSON.parse(text) : null) as Json };
    },
  };
}
