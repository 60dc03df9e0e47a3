/**
 * The sign-off workflow through the API against the real database: draft →
 * submitted → approved or rejected, the history, the audit trail, the
 * "awaiting my sign-off" list, the e-mails the fake SMTP server received,
 * stale versions, segregation of duties and copying a rejected plan.
 * The checksum is recomputed independently with the `canonicalize` package
 * (an RFC 8785 implementation from the registry) and node's SHA-256.
 */
import { createHash } from 'node:crypto';
import canonicalize from 'canonicalize';
import { beforeAll, describe, expect, it } from 'vitest';
import { createTestApp, testOrigin } from '../support/test-app';
import { createUser, signInAs, waitForMail, type SignedInAgent } from '../support/auth';
import { createPlace, insertDraftPlan, type Place } from './support';
import { sqlRows } from '../support/api-fixtures';

const app = createTestApp();
let planner: SignedInAgent;
let approver: SignedInAgent;
let viewer: SignedInAgent;
let place: Place;

beforeAll(async () => {
  [planner, approver, viewer] = await Promise.all([signInAs(app, 'planner'), signInAs(app, 'approver'), signInAs(app, 'viewer')]);
  place = await createPlace(planner);
});

const auditActions = async (planId: string) =>
  (
    await sqlRows<{ action: string; actor_id: string }>(
      'select action, actor_id from audit_events where entity_id = $1 order by id',
      [planId],
    )
  ).map((r) => `${r.action}:${r.actor_id}`);

/** SHA-256 of RFC 8785 JSON of {planId, inputs, results} as stored, computed without the app's code. */
async function independentChecksum(planId: string): Promise<string> {
  const [row] = await sqlRows<{ inputs: unknown; results: unknown }>('select inputs, results from plans where id = $1', [planId]);
  return createHash('sha256')
    .update(canonicalize({ planId, inputs: row?.inputs, results: row?.results }) ?? '', 'utf8')
    .digest('hex');
}

describe('a plan going from draft to approved', () => {
  let planId: string;
  let lastMailId = 0;

  it('is submitted by a planner, with the version they looked at', async () => {
    const plan = await insertDraftPlan(place, planner.user.id);
    planId = plan.id;
    const [{ max } = { max: 0 }] = await sqlRows<{ max: number }>('select coalesce(max(id), 0)::int as max from mail_outbox');
    lastMailId = max;
    const response = await planner
      .post(`/api/plans/${planId}/submit`)
      .send({ version: plan.version, comment: 'Wide spread tomorrow.' });
    expect(response.status, JSON.stringify(response.body)).toBe(200);
    expect(response.body).toMatchObject({
      status: 'submitted',
      version: plan.version + 1,
      submitted: { id: planner.user.id, name: planner.user.name },
    });
    expect(response.body.can).toMatchObject({ submit: false, approve: false });
  });

  it('e-mails every approver, with a link that opens the plan', async () => {
    const mail = await waitForMail(approver.user.email, { sinceId: lastMailId });
    expect(mail.subject).toMatch(/^Plan awaiting your sign-off: /);
    expect(mail.text).toContain(`${planner.user.name} submitted a plan`);
    expect(mail.text).toContain('Wide spread tomorrow.');
    const link = /https?:\/\/\S+/.exec(mail.text)?.[0] ?? '';
    const url = new URL(link);
    expect(url.origin).toBe(testOrigin);
    expect(url.pathname).toBe(`/plans/${planId}`);
    // The page behind the link reads the plan's sign-off record by the id in the link.
    const opened = await approver.get(`/api/plans/${url.pathname.split('/')[2]}/sign-off`);
    expect(opened.status).toBe(200);
    expect(opened.body).toMatchObject({ planId, status: 'submitted', can: { approve: true, reject: true } });
  });

  it('does not e-mail the submitter about their own submission', async () => {
    await expect(waitForMail(planner.user.email, { sinceId: lastMailId, timeoutMs: 300 })).rejects.toThrow(/No e-mail/);
  });

  it('appears in the approver\'s "awaiting my sign-off" list but not the submitter\'s', async () => {
    const mine = await approver.get('/api/sign-off/pending');
    expect(mine.status).toBe(200);
    expect(mine.body.plans.map((p: { planId: string }) => p.planId)).toContain(planId);
    const entry = mine.body.plans.find((p: { planId: string }) => p.planId === planId);
    expect(entry).toMatchObject({ siteName: place.siteName, batteryName: 'Unit 1', submittedBy: { id: planner.user.id } });
    // Planners are not approvers: the access table refuses them.
    expect((await planner.get('/api/sign-off/pending')).status).toBe(403);
  });

  it('is refused with 409 when the approver sends a stale version', async () => {
    const response = await approver.post(`/api/plans/${planId}/approve`).send({ version: 1 });
    expect(response.status).toBe(409);
    expect(response.body.error).toMatch(/you sent version 1, it is now at version 2/);
  });

  it('is approved by an approver: who, when, the comment and the SHA-256 checksum are stored', async () => {
    const response = await approver.post(`/api/plans/${planId}/approve`).send({ version: 2, comment: 'Go ahead.' });
    expect(response.status, JSON.stringify(response.body)).toBe(200);
    expect(response.body).toMatchObject({
      status: 'approved',
      version: 3,
      approved: { id: approver.user.id, comment: 'Go ahead.' },
      checksumVerified: true,
    });
    expect(response.body.checksum).toBe(await independentChecksum(planId));
    const [row] = await sqlRows<{ approved_by: string; approved_at: Date; approval_comment: string }>(
      'select approved_by, approved_at, approval_comment from plans where id = $1',
      [planId],
    );
    expect(row?.approved_by).toBe(approver.user.id);
    expect(Math.abs((row?.approved_at.getTime() ?? 0) - Date.now())).toBeLessThan(60_000);
  });

  it('tells the submitter, with the comment and the checksum', async () => {
    const mail = await waitForMail(planner.user.email, { sinceId: lastMailId });
    expect(mail.subject).toMatch(/^Plan approved: /);
    expect(mail.text).toContain('Comment: Go ahead.');
    expect(mail.text).toContain(await independentChecksum(planId));
    expect(mail.text).toContain(`${testOrigin}/plans/${planId}`);
  });

  it('shows the whole history, readable by a viewer', async () => {
    const response = await viewer.get(`/api/plans/${planId}/sign-off`);
    expect(response.status).toBe(200);
    const events = response.body.events.map((e: { action: string; actorName: string; version: number }) => [
      e.action,
      e.actorName,
      e.version,
    ]);
    expect(events).toEqual([
      ['submitted', planner.user.name, 2],
      ['approved', approver.user.name, 3],
    ]);
    expect(response.body.can).toMatchObject({ approve: false, export: true });
    expect(response.body.submitted.name).toBe(planner.user.name);
  });

  it('records every action in the audit trail with its actor', async () => {
    expect(await auditActions(planId)).toEqual([`plan.submitted:${planner.user.id}`, `plan.approved:${approver.user.id}`]);
  });

  it('cannot be approved, rejected or submitted again', async () => {
    const again = await approver.post(`/api/plans/${planId}/approve`).send({ version: 3 });
    expect(again.status).toBe(409);
    expect(again.body.error).toMatch(/The plan is approved/);
    expect((await approver.post(`/api/plans/${planId}/reject`).send({ version: 3, comment: 'late' })).status).toBe(409);
    expect((await planner.post(`/api/plans/${planId}/submit`).send({ version: 3 })).status).toBe(409);
  });
});

describe('segregation of duties', () => {
  it('refuses a planner approving their own plan (403)', async () => {
    const plan = await insertDraftPlan(place, planner.user.id);
    expect((await planner.post(`/api/plans/${plan.id}/submit`).send({ version: 1 })).status).toBe(200);
    const response = await planner.post(`/api/plans/${plan.id}/approve`).send({ version: 2 });
    expect(response.status).toBe(403);
  });

  it('refuses an admin approving or rejecting a plan they submitted themselves (403 from the service)', async () => {
    const admin = await signInAs(app, 'admin');
    const plan = await insertDraftPlan(place, admin.user.id);
    expect((await admin.post(`/api/plans/${plan.id}/submit`).send({ version: 1 })).status).toBe(200);
    const approve = await admin.post(`/api/plans/${plan.id}/approve`).send({ version: 2 });
    expect(approve.status).toBe(403);
    expect(approve.body.error).toMatch(/You submitted this plan/);
    expect((await admin.post(`/api/plans/${plan.id}/reject`).send({ version: 2, comment: 'no' })).status).toBe(403);
    const [row] = await sqlRows<{ status: string }>('select status from plans where id = $1', [plan.id]);
    expect(row?.status).toBe('submitted');
    // Refused authorisations are audited (SECURITY.md "Logging and audit").
    expect(await auditActions(plan.id)).toEqual([
      `plan.submitted:${admin.user.id}`,
      `access.denied:${admin.user.id}`,
      `access.denied:${admin.user.id}`,
    ]);
  });

  it('is enforced by the database CHECK even for SQL that bypasses the service', async () => {
    const plan = await insertDraftPlan(place, planner.user.id);
    await planner.post(`/api/plans/${plan.id}/submit`).send({ version: 1 });
    await expect(
      sqlRows(
        "update plans set status = 'approved', approved_by = submitted_by, approved_at = now(), checksum = repeat('a', 64) where id = $1",
        [plan.id],
      ),
    ).rejects.toThrow(/plans_approver_not_submitter/);
    await expect(sqlRows('update plans set rejected_by = submitted_by where id = $1', [plan.id])).rejects.toThrow(
      /plans_rejecter_not_submitter/,
    );
  });

  it('never takes status or approver from the request body', async () => {
    const plan = await insertDraftPlan(place, planner.user.id);
    const response = await planner
      .post(`/api/plans/${plan.id}/submit`)
      .send({ version: 1, status: 'approved', approvedBy: approver.user.id });
    expect(response.status).toBe(422);
    const [row] = await sqlRows<{ status: string }>('select status from plans where id = $1', [plan.id]);
    expect(row?.status).toBe('draft');
  });
});

describe('a rejected plan', () => {
  let planId: string;

  it('needs a comment to be rejected', async () => {
    const plan = await insertDraftPlan(place, planner.user.id);
    planId = plan.id;
    await planner.post(`/api/plans/${planId}/submit`).send({ version: 1 });
    const response = await approver.post(`/api/plans/${planId}/reject`).send({ version: 2 });
    expect(response.status).toBe(422);
    expect(JSON.stringify(response.body.issues)).toMatch(/Say why the plan is rejected/);
  });

  it('is rejected with the comment, and the submitter is told why', async () => {
    const [{ max } = { max: 0 }] = await sqlRows<{ max: number }>('select coalesce(max(id), 0)::int as max from mail_outbox');
    const response = await approver
      .post(`/api/plans/${planId}/reject`)
      .send({ version: 2, comment: 'SoC floor too low for the evening peak.' });
    expect(response.status).toBe(200);
    expect(response.body).toMatchObject({
      status: 'rejected',
      rejected: { id: approver.user.id, comment: 'SoC floor too low for the evening peak.' },
      checksum: null,
      can: { copy: false },
    });
    const mail = await waitForMail(planner.user.email, { sinceId: max });
    expect(mail.subject).toMatch(/^Plan rejected: /);
    expect(mail.text).toContain('Comment: SoC floor too low for the evening peak.');
  });

  it('is copied by a planner into a new draft that can be submitted again', async () => {
    const record = await planner.get(`/api/plans/${planId}/sign-off`);
    expect(record.body.can.copy).toBe(true);
    const response = await planner.post(`/api/plans/${planId}/copy`).send({});
    expect(response.status).toBe(201);
    expect(response.body).toMatchObject({ status: 'draft', version: 1, copiedFrom: planId });
    const copyId = response.body.id as string;
    const [source, copy] = await Promise.all(
      [planId, copyId].map(
        async (id) =>
          (
            await sqlRows<{ inputs: unknown; results: unknown; status: string }>(
              'select inputs, results, status from plans where id = $1',
              [id],
            )
          )[0],
      ),
    );
    expect(copy?.inputs).toEqual(source?.inputs);
    expect(copy?.results).toEqual(source?.results);
    expect(source?.status).toBe('rejected');
    expect((await planner.post(`/api/plans/${copyId}/submit`).send({ version: 1 })).status).toBe(200);
    const history = await viewer.get(`/api/plans/${planId}/sign-off`);
    expect(history.body.events.map((e: { action: string }) => e.action)).toEqual(['submitted', 'rejected', 'copied']);
    expect(await auditActions(copyId)).toEqual([`plan.copied:${planner.user.id}`, `plan.submitted:${planner.user.id}`]);
  });

  it('is the only kind of plan that is copied', async () => {
    const draft = await insertDraftPlan(place, planner.user.id);
    const response = await planner.post(`/api/plans/${draft.id}/copy`).send({});
    expect(response.status).toBe(409);
    expect(response.body.error).toMatch(/only a rejected plan is copied/);
  });
});

describe('bad requests', () => {
  it('refuses to submit a plan whose job has not produced results (422)', async () => {
    const plan = await insertDraftPlan(place, planner.user.id, { withResults: false });
    const response = await planner.post(`/api/plans/${plan.id}/submit`).send({ version: 1 });
    expect(response.status).toBe(422);
    expect(response.body.error).toMatch(/no results yet/);
  });

  it('answers 404 for a plan that does not exist and 422 without a version', async () => {
    expect((await planner.post('/api/plans/00000000-0000-4000-8000-000000000000/submit').send({ version: 1 })).status).toBe(404);
    const noVersion = await planner.post(`/api/plans/${(await insertDraftPlan(place, planner.user.id)).id}/submit`).send({});
    expect(noVersion.status).toBe(422);
    expect(JSON.stringify(noVersion.body.issues)).toMatch(/version/);
  });

  it('lets no viewer submit, approve or reject', async () => {
    const plan = await insertDraftPlan(place, planner.user.id);
    expect((await viewer.post(`/api/plans/${plan.id}/submit`).send({ version: 1 })).status).toBe(403);
    expect((await viewer.post(`/api/plans/${plan.id}/approve`).send({ version: 1 })).status).toBe(403);
  });

  it('sends nothing to disabled approvers or to invited ones without a password', async () => {
    const disabled = await createUser('approver', { disabled: true });
    const invited = await createUser('approver', { invited: true });
    const plan = await insertDraftPlan(place, planner.user.id);
    const [{ max } = { max: 0 }] = await sqlRows<{ max: number }>('select coalesce(max(id), 0)::int as max from mail_outbox');
    await planner.post(`/api/plans/${plan.id}/submit`).send({ version: 1 });
    await waitForMail(approver.user.email, { sinceId: max });
    const sent = await sqlRows<{ to: string }>('select "to" from mail_outbox where id > $1', [max]);
    expect(sent.map((m) => m.to).join(' ')).not.toMatch(new RegExp(`${disabled.email}|${invited.email}`));
  });
});
