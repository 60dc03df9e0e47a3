/** The prose of the OpenAPI document: what the API is, its tags, what each error status means. */
export const apiDescription = [
  'JSON under /api. Sign in with a browser session (cookie) or send an API token as `Authorization: Bearer <token>`.',
  'Each operation lists the roles that may call it in `x-roles` (the server refuses every other role with 403);',
  '`x-public` marks routes open without signing in, and `x-api-token: false` those that need a browser session.',
  'Errors are `{error, issues?}`. Token requests have their own rate limit (429 with Retry-After); a token in the URL is refused (400).',
  'POST requests honour an `Idempotency-Key` header for 24 hours.',
  'Schedules are decision support: qualified personnel decide dispatch.',
].join(' ');

export const tagDescriptions: Record<string, string> = {
  System: 'Health and this description.',
  'Sign-in': 'Browser sessions and passwords.',
  Users: 'People and their roles (admins).',
  'Sites and batteries': 'Grid connections and the batteries behind them.',
  Profiles: 'Uploaded price, load and generation series.',
  Plans: 'Dispatch plans: made in the background, exported as CSV.',
  'Sign-off': 'Submitting, approving and rejecting plans.',
  'Horizon studies': 'How far ahead a plan should look, and the background jobs.',
  Administration: 'The audit trail and the mail outbox (admins).',
  'API tokens': 'Tokens for programs, and service users (admins).',
};

export const errorDescriptions: Record<number, string> = {
  400: 'The request is malformed (e.g. an upload cut off, an API token in the URL, a bad Idempotency-Key).',
  401: 'Not signed in, or the API token is mistyped, expired or revoked.',
  403: 'Your role does not allow this; or a cookie request without our Origin; or a token on a route that needs a browser session.',
  404: 'Nothing with this id (or not visible to you).',
  409: 'A conflict: a stale version, a duplicate name, a state that forbids it, or an Idempotency-Key whose first request still runs.',
  410: 'The link was used or has expired.',
  413: 'The upload is larger than allowed.',
  422: 'The input is invalid (see issues), or an Idempotency-Key reused for another request.',
  429: 'Too many requests in a short time: wait as Retry-After says.',
  503: 'Busy or unavailable: retry later.',
};
