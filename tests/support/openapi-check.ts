/**
 * Checks real API answers against the OpenAPI document the server publishes: the
 * operation is found by method and path, the status must be one the document lists,
 * and a JSON body must validate against that status's schema (JSON Schema 2020-12, the
 * dialect of OpenAPI 3.1, by Ajv with ajv-formats for date-time, uuid and the like).
 *
 *   const response = await planner.get('/api/sites');
 *   expectMatchesOpenApi(response);
 */
import Ajv2020, { type ValidateFunction } from 'ajv/dist/2020';
import addFormats from 'ajv-formats';
import type { Response } from 'supertest';
import { expect } from 'vitest';
import { buildOpenApiDocument } from '../../server/openapi/openapi-document';
import { compilePattern, findPattern, type RoutePattern } from '../../server/auth/route-pattern';

type Json = Record<string, any>; // eslint-disable-line @typescript-eslint/no-explicit-any -- a parsed JSON document

export const openApiJson = (): Json => JSON.parse(JSON.stringify(buildOpenApiDocument())) as Json;

const doc = openApiJson();
const ajv = new Ajv2020({ strict: false, allErrors: true, logger: false });
addFormats(ajv);
ajv.addFormat('binary', true);
ajv.addSchema({ $id: 'openapi', components: doc.components, paths: doc.paths });

interface Operation extends RoutePattern {
  template: string;
}

const operations: Operation[] = Object.keys(doc.paths as Json).flatMap((template) =>
  Object.keys(doc.paths[template] as Json).map((method) => ({
    ...compilePattern(method, template.replace(/\{([^}]+)\}/g, ':$1')),
    template,
  })),
);

const pointer = (...parts: string[]) => parts.map((p) => p.replaceAll('~', '~0').replaceAll('/', '~1')).join('/');
const validators = new Map<string, ValidateFunction>();

function validatorFor(template: string, method: string, status: string, mediaType: string): ValidateFunction {
  const ref = `openapi#/${pointer('paths', template, method, 'responses', status, 'content', mediaType, 'schema')}`;
  let validate = validators.get(ref);
  if (!validate) {
    validate = ajv.compile({ $ref: ref });
    validators.set(ref, validate);
  }
  return validate;
}

/** Fails the test unless the answer is one the published document describes. */
export function expectMatchesOpenApi(response: Response): void {
  const request = (response as unknown as { req: { method: string; path: string } }).req;
  const path = new URL(request.path, 'http://x').pathname;
  const operation = findPattern(operations, request.method, path);
  const what = `${request.method} ${path} → ${response.status}`;
  expect(operation, `${what}: no operation in the OpenAPI document`).toBeTruthy();
  if (!operation) return;
  const method = request.method === 'HEAD' ? 'get' : request.method.toLowerCase();
  const described = doc.paths[operation.template][method].responses[String(response.status)] as Json | undefined;
  expect(described, `${what}: the document lists no such status for ${operation.template}`).toBeTruthy();
  const content = (described?.content ?? {}) as Json;
  const contentType = String(response.headers['content-type'] ?? '');
  if (contentType.startsWith('application/json')) {
    expect(Object.keys(content), `${what}: the document describes no JSON body`).toContain('application/json');
    const validate = validatorFor(operation.template, method, String(response.status), 'application/json');
    const valid = validate(response.body);
    expect(valid, `${what}: ${ajv.errorsText(validate.errors)}`).toBe(true);
  } else if (contentType.startsWith('text/csv')) {
    expect(Object.keys(content), `${what}: the document describes no CSV`).toContain('text/csv');
  } else {
    expect(Object.keys(content), `${what}: the document promises a body, none came`).toEqual([]);
  }
}
