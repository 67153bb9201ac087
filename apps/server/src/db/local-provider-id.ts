/** Namespacing of the fake identity provider's user ids. */

/** The code host's own ids are numeric, so a `local:` prefix can never collide with them. */
export function localProviderId(login: string): string {
  return `local:${login.toLowerCase()}`;
}
