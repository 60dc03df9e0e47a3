/** Plans, sign-off, horizon previews, horizon studies and background jobs. */
import { z } from 'zod';
import { planCreateSchema, planListQuerySchema } from '@shared/schemas/plan';
import { copyActionSchema, rejectActionSchema, signOffActionSchema } from '@shared/schemas/sign-off';
import { horizonPreviewRequestSchema } from '@shared/schemas/horizon-preview';
import { studyCreateSchema, studyListQuerySchema } from '@shared/schemas/study';
import { jobListQuerySchema } from '@shared/schemas/job';
import { planCreatedSchema, planDefaultsSchema, planSchema } from '@shared/schemas/responses/plan-responses';
import {
  approvalRecordSchema,
  horizonPreviewSchema,
  pendingSignOffListSchema,
  planCopySchema,
  signOffRecordSchema,
} from '@shared/schemas/responses/sign-off-responses';
import { studyCreatedSchema, studySchema } from '@shared/schemas/responses/study-responses';
import { jobListItemSchema } from '@shared/schemas/responses/job-responses';
import type { AccessKey } from '../../auth/access-table';
import { uuidParams, type OperationSpec } from '../operation-spec';

const signOff = (summary: string, body: z.ZodType, schema: z.ZodType = signOffRecordSchema): OperationSpec => ({
  tag: 'Sign-off',
  summary,
  params: uuidParams,
  body,
  responses: { 200: { description: "The plan's sign-off record after the action.", schema } },
  errors: [409],
});

export const planStudyOperations = {
  'POST /api/plans': {
    tag: 'Plans',
    summary: 'Make a plan for a battery and delivery window; it is computed in the background.',
    body: planCreateSchema,
    responses: { 202: { description: 'Queued: the plan (draft) and its job.', schema: planCreatedSchema } },
  },
  'GET /api/plans': {
    tag: 'Plans',
    summary: 'Plans with their headline figures, newest first.',
    query: planListQuerySchema,
    responses: { 200: { description: 'The plans.', schema: z.array(planSchema) } },
  },
  'GET /api/plans/:id': {
    tag: 'Plans',
    summary: 'One plan: status, progress, inputs snapshot, results and turnpike figures.',
    params: uuidParams,
    responses: { 200: { description: 'The plan.', schema: planSchema } },
  },
  'POST /api/plans/:id/submit': signOff('Submit a finished draft for sign-off.', signOffActionSchema),
  'POST /api/plans/:id/approve': signOff(
    'Approve a submitted plan (never one you submitted); fixes its checksum.',
    signOffActionSchema,
    approvalRecordSchema,
  ),
  'POST /api/plans/:id/reject': signOff('Reject a submitted plan, saying why.', rejectActionSchema),
  'GET /api/plans/:id/export.csv': {
    tag: 'Plans',
    summary: 'The schedule as RFC 4180 CSV (viewers: approved plans only); the checksum is verified before sending.',
    params: uuidParams,
    responses: {
      200: { description: 'The CSV file; `X-Slackwater-Plan-Status` and `X-Slackwater-Checksum` headers.', csv: true },
    },
  },
  'POST /api/plans/:id/copy': {
    tag: 'Sign-off',
    summary: 'Copy a rejected plan into a new draft.',
    params: uuidParams,
    body: copyActionSchema,
    responses: { 201: { description: 'The new draft.', schema: planCopySchema } },
    errors: [409],
  },
  'GET /api/plans/:id/sign-off': {
    tag: 'Sign-off',
    summary: 'Who submitted and signed off, when, the checksum and the whole history.',
    params: uuidParams,
    responses: { 200: { description: 'The sign-off record.', schema: signOffRecordSchema } },
  },
  'POST /api/plans/:id/horizon-preview': {
    tag: 'Plans',
    summary: "Re-solve the plan's own inputs with another horizon on the exact path; stores nothing.",
    params: uuidParams,
    body: horizonPreviewRequestSchema,
    responses: { 200: { description: 'The preview.', schema: horizonPreviewSchema } },
    errors: [429, 503],
  },
  'GET /api/sign-off/pending': {
    tag: 'Sign-off',
    summary: 'Submitted plans awaiting your sign-off (never your own submissions).',
    responses: { 200: { description: 'The plans.', schema: pendingSignOffListSchema } },
  },
  'POST /api/studies': {
    tag: 'Horizon studies',
    summary: 'Run receding-horizon plans over a period for several horizons and terminal rules.',
    body: studyCreateSchema,
    responses: { 202: { description: 'Queued: the study and its job.', schema: studyCreatedSchema } },
  },
  'GET /api/studies': {
    tag: 'Horizon studies',
    summary: 'Studies with their recommendation, newest first.',
    query: studyListQuerySchema,
    responses: { 200: { description: 'The studies.', schema: z.array(studySchema) } },
  },
  'GET /api/studies/:id': {
    tag: 'Horizon studies',
    summary: 'One study with its runs.',
    params: uuidParams,
    responses: { 200: { description: 'The study.', schema: studySchema } },
  },
  'GET /api/batteries/:id/plan-defaults': {
    tag: 'Plans',
    summary: "What the plan form proposes: the initial SoC (from the latest approved plan's end) and the horizon.",
    params: uuidParams,
    query: z.object({ deliveryStart: z.iso.datetime({ offset: true }).optional() }),
    responses: { 200: { description: 'The defaults.', schema: planDefaultsSchema } },
  },
  'GET /api/jobs': {
    tag: 'Horizon studies',
    summary: 'Background jobs with progress, newest first.',
    query: jobListQuerySchema,
    responses: { 200: { description: 'The jobs.', schema: z.array(jobListItemSchema) } },
  },
} as const satisfies Partial<Record<AccessKey, OperationSpec>>;
