/** Sites, batteries and profiles. */
import { z } from 'zod';
import { siteCreateSchema, sitePatchSchema } from '@shared/schemas/site';
import { batteryCreateSchema, batteryPatchSchema } from '@shared/schemas/battery';
import { profileListQuerySchema, profileWindowQuerySchema } from '@shared/schemas/profile';
import { batteryResponseSchema, siteSchema } from '@shared/schemas/responses/site-responses';
import { profileDetailSchema, profileSummarySchema, profileUploadFormSchema } from '@shared/schemas/responses/profile-responses';
import type { AccessKey } from '../../auth/access-table';
import { uuidParams, type OperationSpec } from '../operation-spec';

export const siteProfileOperations = {
  'GET /api/sites': {
    tag: 'Sites and batteries',
    summary: 'Every site, with how many batteries and profiles it has.',
    responses: { 200: { description: 'The sites.', schema: z.array(siteSchema) } },
  },
  'POST /api/sites': {
    tag: 'Sites and batteries',
    summary: 'Create a site: a grid connection with a time zone, limits and a tariff.',
    body: siteCreateSchema,
    responses: { 201: { description: 'Created.', schema: siteSchema } },
    errors: [409],
  },
  'GET /api/sites/:id': {
    tag: 'Sites and batteries',
    summary: 'One site.',
    params: uuidParams,
    responses: { 200: { description: 'The site.', schema: siteSchema } },
  },
  'PATCH /api/sites/:id': {
    tag: 'Sites and batteries',
    summary: 'Change some fields of a site.',
    params: uuidParams,
    body: sitePatchSchema,
    responses: { 200: { description: 'The site as changed.', schema: siteSchema } },
    errors: [409],
  },
  'GET /api/sites/:id/batteries': {
    tag: 'Sites and batteries',
    summary: "The site's batteries.",
    params: uuidParams,
    responses: { 200: { description: 'The batteries.', schema: z.array(batteryResponseSchema) } },
  },
  'POST /api/sites/:id/batteries': {
    tag: 'Sites and batteries',
    summary: 'Add a battery; parameters left out take lithium-ion defaults.',
    params: uuidParams,
    body: batteryCreateSchema,
    responses: {
      201: { description: 'Created, with warnings for settings outside common practice.', schema: batteryResponseSchema },
    },
    errors: [409],
  },
  'GET /api/batteries/:id': {
    tag: 'Sites and batteries',
    summary: 'One battery.',
    params: uuidParams,
    responses: { 200: { description: 'The battery.', schema: batteryResponseSchema } },
  },
  'PATCH /api/batteries/:id': {
    tag: 'Sites and batteries',
    summary: 'Change a battery; send the version you read (409 when it changed meanwhile).',
    params: uuidParams,
    body: batteryPatchSchema,
    responses: { 200: { description: 'The battery as changed.', schema: batteryResponseSchema } },
    errors: [409],
  },
  'POST /api/sites/:id/profiles': {
    tag: 'Profiles',
    summary: 'Upload a price, load or generation profile as CSV.',
    description:
      'Multipart form with the file and its options. A rejected file answers 422 with every problem by line and stores nothing. ' +
      'The same file sent again for the same site and kind, read the same way and under the same name, answers 200 with the profile already stored.',
    params: uuidParams,
    form: profileUploadFormSchema,
    responses: {
      201: { description: 'Stored.', schema: profileSummarySchema },
      200: { description: 'The same file was stored before: that profile, nothing new.', schema: profileSummarySchema },
    },
    errors: [400, 413],
  },
  'GET /api/sites/:id/profiles': {
    tag: 'Profiles',
    summary: "The site's profiles without their values, newest first.",
    params: uuidParams,
    query: profileListQuerySchema,
    responses: { 200: { description: 'The profiles.', schema: z.array(profileSummarySchema) } },
  },
  'GET /api/profiles/:id': {
    tag: 'Profiles',
    summary: 'A profile with its values, or those of the window [from, to).',
    params: uuidParams,
    query: profileWindowQuerySchema,
    responses: { 200: { description: 'The profile and values.', schema: profileDetailSchema } },
  },
  'GET /api/profiles/:id/original': {
    tag: 'Profiles',
    summary: 'The file exactly as uploaded (a `Digest` header holds its SHA-256).',
    params: uuidParams,
    responses: { 200: { description: 'The original CSV.', csv: true } },
  },
  'DELETE /api/profiles/:id': {
    tag: 'Profiles',
    summary: 'Delete a profile no plan rests on.',
    params: uuidParams,
    responses: { 204: { description: 'Deleted.' } },
    errors: [409],
  },
} as const satisfies Partial<Record<AccessKey, OperationSpec>>;
