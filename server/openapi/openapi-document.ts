/**
 * Builds the OpenAPI 3.1 document from the access table (routes and roles), the
 * operation descriptions and the shared zod schemas, with @asteasolutions/zod-to-openapi.
 * Nothing here is written by hand that the code already knows: `x-roles` is the table's
 * line, bodies and answers are the schemas the server validates with and the types it
 * sends (shared/schemas/responses proves those match at compile time).
 */
import { OpenAPIRegistry, OpenApiGeneratorV31, type RouteConfig } from '@asteasolutions/zod-to-openapi';
import { z } from 'zod';
import { roles } from '@shared/schemas/auth';
import { errorSchema } from '@shared/schemas/responses/common';
import { compileAccessTable, type AccessRule } from '../auth/access-control';
import { sessionOnlyRoutes } from '../tokens/session-only-routes';
import { operations } from './openapi-operations';
import type { OperationSpec } from './operation-spec';
import { apiDescription, errorDescriptions, tagDescriptions } from './openapi-words';

const idempotencyHeader = z.object({
  'Idempotency-Key': z.string().max(255).optional().meta({
    description: 'Send the same key with a retry: the first successful answer comes back (24 hours), nothing runs twice.',
  }),
});

type OpenAPIObject = ReturnType<OpenApiGeneratorV31['generateDocument']>;

const sessionOnly = new Set<string>(sessionOnlyRoutes);

/** `/api/plans/:id/submit` → `/api/plans/{id}/submit`. */
export const openApiPath = (path: string) => path.replace(/:([A-Za-z_][A-Za-z0-9_]*)/g, '{$1}');

function operationId(rule: AccessRule): string {
  const words = rule.path
    .split('/')
    .filter((s) => s && s !== 'api')
    .map((s) => (s.startsWith(':') ? `By${s.slice(1)}` : s))
    .flatMap((s) => s.split(/[^A-Za-z0-9]+/))
    .map((s) => s.charAt(0).toUpperCase() + s.slice(1));
  return `${rule.method.toLowerCase()}${words.join('')}`;
}

function errorStatuses(rule: AccessRule, spec: OperationSpec): number[] {
  // Any request can carry a token in its URL (400); any token request can pass its rate limit (429).
  const statuses = new Set([400, 429, ...(spec.errors ?? [])]);
  if (rule.access !== 'public') [401, 403].forEach((s) => statuses.add(s));
  if (rule.path.includes('/:')) statuses.add(404);
  if (spec.body || spec.form || spec.query) statuses.add(422);
  if (rule.method === 'POST' && rule.access !== 'public') [409, 422].forEach((s) => statuses.add(s));
  return [...statuses].sort((a, b) => a - b);
}

function responses(rule: AccessRule, spec: OperationSpec): RouteConfig['responses'] {
  const out: RouteConfig['responses'] = {};
  for (const [status, success] of Object.entries(spec.responses)) {
    const content = success.csv
      ? { 'text/csv': { schema: { type: 'string' as const } } }
      : success.schema
        ? { 'application/json': { schema: success.schema } }
        : undefined;
    out[status] = { description: success.description, ...(content ? { content } : {}) };
  }
  for (const status of errorStatuses(rule, spec)) {
    out[String(status)] = {
      description: errorDescriptions[status] ?? 'Refused: see error.',
      content: { 'application/json': { schema: errorSchema } },
    };
  }
  return out;
}

function route(rule: AccessRule, spec: OperationSpec): RouteConfig {
  const params = spec.params ?? (rule.path.includes('/:') ? z.object({ id: z.string() }) : undefined);
  const body = spec.form
    ? { required: true, content: { 'multipart/form-data': { schema: spec.form } } }
    : spec.body
      ? { required: true, content: { 'application/json': { schema: spec.body } } }
      : undefined;
  const isPublic = rule.access === 'public';
  return {
    method: rule.method.toLowerCase() as RouteConfig['method'],
    path: openApiPath(rule.path),
    operationId: operationId(rule),
    tags: [spec.tag],
    summary: spec.summary,
    ...(spec.description ? { description: spec.description } : {}),
    request: {
      ...(params ? { params } : {}),
      ...(spec.query ? { query: spec.query as z.ZodObject } : {}),
      ...(rule.method === 'POST' && !isPublic ? { headers: idempotencyHeader } : {}),
      ...(body ? { body } : {}),
    },
    responses: responses(rule, spec),
    ...(isPublic ? { security: [] } : sessionOnly.has(rule.key) ? { security: [{ session: [] }] } : {}),
    'x-roles': isPublic ? [...roles] : [...rule.access],
    'x-public': isPublic,
    'x-api-token': !isPublic && !sessionOnly.has(rule.key),
  };
}

export function buildOpenApiDocument(): OpenAPIObject {
  const registry = new OpenAPIRegistry();
  registry.registerComponent('securitySchemes', 'session', {
    type: 'apiKey',
    in: 'cookie',
    name: 'slackwater_session',
    description: 'The browser session from POST /api/auth/sign-in. Requests that change data must send a matching Origin header.',
  });
  registry.registerComponent('securitySchemes', 'token', {
    type: 'http',
    scheme: 'bearer',
    description:
      'An API token (Settings → API tokens): `Authorization: Bearer swt_…`. No Origin header needed; never put it in a URL.',
  });
  for (const rule of compileAccessTable()) {
    registry.registerPath(route(rule, operations[rule.key as keyof typeof operations]));
  }
  return new OpenApiGeneratorV31(registry.definitions).generateDocument({
    openapi: '3.1.0',
    info: { title: 'Slackwater API', version: '1', description: apiDescription },
    security: [{ session: [] }, { token: [] }],
    tags: Object.entries(tagDescriptions).map(([name, description]) => ({ name, description })),
  });
}

let cached: OpenAPIObject | null = null;

/** Built once per process: the routes and schemas do not change while it runs. */
export function openApiDocument(): OpenAPIObject {
  cached ??= buildOpenApiDocument();
  return cached;
}
