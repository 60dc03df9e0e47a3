/**
 * Two approvers at once: exactly one wins (SECURITY.md test 3). Twenty
 * approval requests for one submitted plan are fired together from several
 * approver sessions; the single conditional UPDATE lets one through and the
 * rest update zero rows, which the API answers with 409.
 */
import { beforeAll, describe, expect, it } from 'vitest';
import { createTestApp } from '../support/test-app';
import { signInAs, type SignedInAgent } from '../support/auth';
import { getDb } from '../../server/db/client';
import { findPlanForSignOff as findPlan, markApproved } from '../../server/plans/plans.repo';
import { planChecksum } from '../../server/sign-off/plan-checksum';
import { createPlace, insertDraftPlan, type Place } from './support';
import { sqlRows } from '../support/api-fixtures';

const app = createTestApp();
let planner: SignedInAgent;
let approvers: SignedInAgent[];
let place: Place;

beforeAll(async () => {
  planner = await signInAs(app, 'planner');
  approvers = await Promise.all([
    signInAs(app, 'approver'),
    signInAs(app, 'approver'),
    signInAs(app, 'admin'),
    signInAs(app, 'approver'),
  ]);
  place = await createPlace(planner);
});

describe('20 parallel approvals of one plan', () => {
  it('give exactly one 200 and nineteen 409, and the plan is approved once', async () => {
    const plan = await insertDraftPlan(place, planner.user.id);
    expect((await planner.post(`/api/plans/${plan.id}/submit`).send({ version: 1 })).status).toBe(200);

    const responses = await Promise.all(
      Array.from({ length: 20 }, (_, i) =>
        (approvers[i % approvers.length] as SignedInAgent)
          .post(`/api/plans/${plan.id}/approve`)
          .send({ version: 2, comment: `attempt ${i}` }),
      ),
    );
    const statuses = responses.map((r) => r.status).sort();
    expect(statuses.filter((s) => s === 200)).toHaveLength(1);
    expect(statuses.filter((s) => s === 409)).toHaveLength(19);

    const winner = responses.find((r) => r.status === 200);
    const [row] = await sqlRows<{ status: string; version: number; approval_comment: string; approved_by: string }>(
      'select status, version, approval_comment, approved_by from plans where id = $1',
      [plan.id],
    );
    expect(row).toMatchObject({
      status: 'approved',
      version: 3,
      approval_comment: winner?.body.approved.comment,
      approved_by: winner?.body.approved.id,
    });
    const events = await sqlRows<{ action: string }>(
      "select action from plan_events where plan_id = $1 and action = 'approved'",
      [plan.id],
    );
    expect(events).toHaveLength(1);
    const audit = await sqlRows<{ action: string }>(
      "select action from audit_events where entity_id = $1 and action = 'plan.approved'",
      [plan.id],
    );
    expect(audit).toHaveLength(1);
    // The losers are told what happened, not just "conflict".
    for (const r of responses.filter((x) => x.status === 409))
      expect(r.body.error).toMatch(/The plan is approved|version 2, it is now at version 3/);
  });
});

describe('the approving statement on its own', () => {
  it('matches for exactly one of 20 concurrent transactions, without any other lock', async () => {
    const plan = await insertDraftPlan(place, planner.user.id);
    await planner.post(`/api/plans/${plan.id}/submit`).send({ version: 1 });
    const before = await findPlan(getDb(), plan.id);
    const checksum = planChecksum({ planId: plan.id, inputs: before?.inputs, results: before?.results });
    // Each attempt runs in its own transaction on its own pooled connection, straight
    // at the repo: no advisory lock, no pre-check; only the WHERE clause decides.
    const rows = await Promise.all(
      Array.from({ length: 20 }, (_, i) =>
        getDb().transaction((tx) =>
          markApproved(tx, {
            id: plan.id,
            version: 2,
            userId: (approvers[i % approvers.length] as SignedInAgent).user.id,
            comment: null,
            checksum,
            fingerprint: before?.fingerprint ?? '',
          }),
        ),
      ),
    );
    expect(rows.filter((r) => r !== null)).toHaveLength(1);
  });

  it('never matches for the submitter, or after the inputs or results changed', async () => {
    const plan = await insertDraftPlan(place, planner.user.id);
    await planner.post(`/api/plans/${plan.id}/submit`).send({ version: 1 });
    const before = await findPlan(getDb(), plan.id);
    const base = { id: plan.id, version: 2, comment: null, checksum: 'c'.repeat(64), fingerprint: before?.fingerprint ?? '' };
    expect(await markApproved(getDb(), { ...base, userId: planner.user.id })).toBeNull();
    await sqlRows(`update plans set results = jsonb_set(results, '{steps,0,chargeKw}', '1') where id = $1`, [plan.id]);
    expect(await markApproved(getDb(), { ...base, userId: (approvers[0] as SignedInAgent).user.id })).toBeNull();
  });
});
