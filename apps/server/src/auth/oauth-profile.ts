/** The provider-neutral account data a sign-in produces. */

/** What either identity provider tells us about the person signing in. */
export type OAuthProfile = {
  /** The provider's user id; the fake provider's are prefixed `local:`. */
  providerId: string;
  login: string;
  name: string;
  email: string | null;
  avatarUrl: string | null;
};
