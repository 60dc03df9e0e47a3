/**
 * The description of every route in the access table. Typed as a record over the
 * table's keys, so a route added to the table without its description here does not
 * compile; the OpenAPI test checks the built document against the table as well.
 */
import { z } from 'zod';
import type { AccessKey } from '../auth/access-table';
import type { OperationSpec } from './operation-spec';
import { authUserOperations } from './operations/auth-users';
import { siteProfileOperations } from './operations/sites-profiles';
import { planStudyOperations } from './operations/plans-studies';
import { adminTokenOperations } from './operations/admin-tokens';

export const operations: Record<AccessKey, OperationSpec> = {
  ...authUserOperations,
  ...siteProfileOperations,
  ...planStudyOperations,
  ...adminTokenOperations,
  'GET /api/openapi.json': {
    tag: 'System',
    summary: 'This description of the API (OpenAPI 3.1), for anyone signed in.',
    responses: { 200: { description: 'The OpenAPI document.', schema: z.looseObject({ openapi: z.string() }) } },
  },
};
