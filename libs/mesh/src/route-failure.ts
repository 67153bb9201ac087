/** Why a route request has no answer: a stable reason and a sentence naming the values involved. */

export type RouteFailureReason =
  | 'unknown-port'
  | 'port-taken'
  | 'wrong-parity'
  | 'too-short'
  | 'no-free-path'
  | 'dead-gates-in-the-way'
  | 'not-enough-free-area'
  | 'search-limit'
  | 'invalid-request'
  | 'duplicate-circuit';

/** A route that could not be placed. */
export type RouteFailure = { readonly ok: false; readonly reason: RouteFailureReason; readonly message: string };

export function routeFailure(reason: RouteFailureReason, message: string): RouteFailure {
  return { ok: false, reason, message };
}
