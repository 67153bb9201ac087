/** The user document the fake provider returns from its user endpoint. */

/** Same field names as the code host's user endpoint; `id` is namespaced `local:<login>`. */
export type LocalIdpProfile = {
  id: string;
  login: string;
  name: string;
  email: string | null;
  avatar_url: string | null;
};
