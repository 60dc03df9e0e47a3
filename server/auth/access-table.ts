/**
 * THE access-control table: every API route with the roles allowed to call it
 * (DESIGN sections 5 and 6; ASVS 5.0 8.2.1-8.3.1). Deny by default: a request that
 * matches no line here never reaches a handler. When you add a route, add its line.
 *
 * Key: `'METHOD /api/path/:param'` (Express-style params, no query string; HEAD is
 * checked as GET). Value: `'public'` (anyone, signed in or not) or the allowed roles.
 * Object-level rules (a viewer exports approved plans only, an approver never approves
 * their own plan) stay in the services: this table is the first gate, not the only one.
 */
import { permissions, type Role } from '@shared/schemas/auth';

export type Access = 'public' | readonly Role[];

const readers = permissions['data.read'];
const editors = permissions['data.edit'];
const approvers = permissions['plans.approve'];
const signedIn = permissions['data.read'];
const admins = permissions['users.manage'];

export const accessTable = {
  'GET /api/health': 'public',
  'GET /api/openapi.json': signedIn, // the OpenAPI 3.1 description of every route in this table

  // Sign-in and the session
  'POST /api/auth/sign-in': 'public',
  'POST /api/auth/sign-out': 'public', // ends the caller's session if there is one; idempotent
  'GET /api/auth/me': signedIn,
  'POST /api/auth/password': signedIn, // change one's own password (current + new)
  // One-time links (invitation, forgotten password): the token is the credential
  'POST /api/auth/password-reset': 'public', // ask for a reset link; same answer whether or not the e-mail is known
  'POST /api/auth/password-links/check': 'public',
  'POST /api/auth/password-links/redeem': 'public',

  // Users (admin only)
  'GET /api/users': admins,
  'POST /api/users': admins, // invite by e-mail with a role
  'PATCH /api/users/:id': admins, // name, role, disabled
  'POST /api/users/:id/invitations': admins, // send a fresh invitation link

  // Sites and batteries
  'GET /api/sites': readers,
  'POST /api/sites': editors,
  'GET /api/sites/:id': readers,
  'PATCH /api/sites/:id': editors,
  'GET /api/sites/:id/batteries': readers,
  'POST /api/sites/:id/batteries': editors,
  'GET /api/batteries/:id': readers,
  'PATCH /api/batteries/:id': editors,

  // Profiles
  'POST /api/sites/:id/profiles': editors,
  'GET /api/sites/:id/profiles': readers,
  'GET /api/profiles/:id': readers,
  'GET /api/profiles/:id/original': readers, // the file as uploaded
  'DELETE /api/profiles/:id': editors, // refused (409) while a submitted or approved plan rests on it

  // Plans and sign-off
  'POST /api/plans': editors,
  'GET /api/plans': readers,
  'GET /api/plans/:id': readers,
  'POST /api/plans/:id/submit': editors,
  'POST /api/plans/:id/approve': approvers,
  'POST /api/plans/:id/reject': approvers,
  'GET /api/plans/:id/export.csv': readers, // the export service restricts viewers to approved plans
  'POST /api/plans/:id/copy': editors, // a rejected plan becomes a new draft
  'GET /api/plans/:id/sign-off': readers, // who submitted, who signed off, the checksum, the history
  'POST /api/plans/:id/horizon-preview': readers, // re-solves the plan with another horizon on the fast path; writes nothing
  'GET /api/sign-off/pending': approvers, // plans awaiting my sign-off (never my own submissions)

  // Horizon studies
  'POST /api/studies': editors,
  'GET /api/studies': readers, // list with status filter
  'GET /api/studies/:id': readers,
  'GET /api/batteries/:id/plan-defaults': readers, // the plan form's proposed initial SoC and horizon
  'GET /api/jobs': readers, // background jobs with progress (the home page's attention list)

  // API tokens: one's own (the secret is shown once); admins also manage service users and their tokens.
  // Creating tokens needs a browser session (server/tokens/session-only-routes.ts).
  'GET /api/tokens': signedIn,
  'POST /api/tokens': signedIn,
  'DELETE /api/tokens/:id': signedIn, // one's own; an admin may revoke anyone's
  'GET /api/service-users': admins,
  'POST /api/service-users': admins, // a name and a role; no password, no sign-in
  'POST /api/service-users/:id/tokens': admins,

  // Audit trail and mail outbox (admin only)
  'GET /api/audit': admins,
  'GET /api/mail/outbox': admins,
  'GET /api/mail/outbox/:id': admins,
} as const satisfies Record<string, Access>;

export type AccessKey = keyof typeof accessTable;
