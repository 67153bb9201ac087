// Route paths of the web app, as constants and builders (never spelled out in components).

/** Route patterns for React Router. */
export const ROUTES = {
  root: '/',
  signIn: '/signin',
  teamHome: '/t/:teamSlug',
  teamMembers: '/t/:teamSlug/members',
  teamOutbox: '/t/:teamSlug/outbox',
  chip: '/t/:teamSlug/chips/:chipId',
  configuration: '/t/:teamSlug/configurations/:configurationId',
  notFound: '*',
} as const;

/** Path of a team's home page. */
export function teamHomePath(teamSlug: string): string {
  return `/t/${encodeURIComponent(teamSlug)}`;
}

/** Path of a team's outbox (the mail the server sent; owners). */
export function teamOutboxPath(teamSlug: string): string {
  return `${teamHomePath(teamSlug)}/outbox`;
}

/** Path of a team's members page. */
export function teamMembersPath(teamSlug: string): string {
  return `${teamHomePath(teamSlug)}/members`;
}

/** Path of one chip of a team: its mesh, technology, calibration and dead gates. */
export function chipPath(teamSlug: string, chipId: string): string {
  return `${teamHomePath(teamSlug)}/chips/${encodeURIComponent(chipId)}`;
}

/** Path of one configuration of a team. */
export function configurationPath(teamSlug: string, configurationId: string): string {
  return `${teamHomePath(teamSlug)}/configurations/${encodeURIComponent(configurationId)}`;
}

/** Path of the sign-in page that comes back to `returnTo` afterwards. */
export function signInPath(returnTo?: string): string {
  const target = returnTo === undefined ? undefined : safeReturnTo(returnTo);
  return target && target !== ROUTES.root ? `${ROUTES.signIn}?returnTo=${encodeURIComponent(target)}` : ROUTES.signIn;
}

/** Server URL that starts the sign-in flow (a full-page navigation, not a fetch). */
export function loginUrl(returnTo: string): string {
  return `/api/auth/login?returnTo=${encodeURIComponent(safeReturnTo(returnTo))}`;
}

/**
 * Keeps only same-site paths ("/t/x"); anything else ("//evil", "https://…", "/signin") becomes "/".
 * Stops open redirects and sign-in loops.
 */
export function safeReturnTo(value: string | null | undefined): string {
  if (!value || !value.startsWith('/') || value.startsWith('//') || value.startsWith('/\\')) return ROUTES.root;
  if (value === ROUTES.signIn || value.startsWith(`${ROUTES.signIn}?`) || value.startsWith('/api/')) return ROUTES.root;
  return value;
}
