/**
 * An approved plan never changes, and the database itself refuses it: raw SQL
 * on a plain connection (as any other program with database access would
 * run it) cannot UPDATE or DELETE an approved plan or its series, cannot
 * TRUNCATE the table under it, and cannot rewrite the sign-off history. The
 * one change allowed is approved → superseded by a newer approved plan of the
 * same battery with an overlapping window.
 */
import { beforeAll, describe, expect, it } from 'vitest';
import { createTestApp } from '../support/test-app';
import { signInAs, type SignedInAgent } from '../support/auth';
import { createPlace, insertDraftPlan, type Place } from './support';
import { sqlRows } from '../support/api-fixtures';

const app = createTestApp();
let planner: SignedInAgent;
let approver: SignedInAgent;
let place: Place;
let approvedId: string;

async function approve(o: Parameters<typeof insertDraftPlan>[2] = {}, where: Place = place): Promise<string> {
  const plan = await insertDraftPlan(where, planner.user.id, o);
  expect((await planner.post(`/api/plans/${plan.id}/submit`).send({ version: 1 })).status).toBe(200);
  const response = await approver.post(`/api/plans/${plan.id}/approve`).send({ version: 2 });
  expect(response.status, JSON.stringify(response.body)).toBe(200);
  return plan.id;
}

beforeAll(async () => {
  [planner, approver] = await Promise.all([signInAs(app, 'planner'), signInAs(app, 'approver')]);
  place = await createPlace(planner);
  approvedId = await approve({ fromHour: 0, hours: 6 });
});

const refused = /a signed-off plan cannot be (changed|deleted)/;

describe('the database refuses changes to an approved plan', () => {
  it.each([
    ['its series', `update plans set results = jsonb_set(results, '{steps,0,chargeKw}', '0') where id = $1`],
    ['its inputs snapshot', `update plans set inputs = jsonb_set(inputs, '{battery,energyKwh}', '9999') where id = $1`],
    ['its checksum', `update plans set checksum = repeat('0', 64) where id = $1`],
    ['its approval comment', `update plans set approval_comment = 'edited later' where id = $1`],
    ['its status back to draft', `update plans set status = 'draft' where id = $1`],
    ['only its updated_at', `update plans set updated_at = now() where id = $1`],
  ])('UPDATE of %s', async (_what, statement) => {
    await expect(sqlRows(statement, [approvedId])).rejects.toThrow(refused);
  });

  it('DELETE', async () => {
    await expect(sqlRows('delete from plans where id = $1', [approvedId])).rejects.toThrow(refused);
    expect(await sqlRows('select 1 from plans where id = $1', [approvedId])).toHaveLength(1);
  });

  it('TRUNCATE while signed-off plans exist', async () => {
    await expect(sqlRows('truncate plans cascade')).rejects.toThrow(/holds signed-off plans/);
  });

  it('marking it superseded without an approved successor of the same battery and window', async () => {
    const draft = await insertDraftPlan(place, planner.user.id, { fromHour: 0, hours: 6 });
    await expect(
      sqlRows(
        "update plans set status = 'superseded', superseded_by = $2, superseded_at = now(), version = version + 1 where id = $1",
        [approvedId, draft.id],
      ),
    ).rejects.toThrow(/superseded only by an approved plan of the same battery/);
  });

  it('and the service refuses it too: nothing approved can be submitted, approved or rejected again', async () => {
    expect((await approver.post(`/api/plans/${approvedId}/reject`).send({ version: 3, comment: 'too late' })).status).toBe(409);
  });
});

describe('the sign-off history is append-only', () => {
  it('refuses UPDATE and DELETE of plan events', async () => {
    await expect(sqlRows("update plan_events set comment = 'rewritten' where plan_id = $1", [approvedId])).rejects.toThrow(
      /append-only/,
    );
    await expect(sqlRows('delete from plan_events where plan_id = $1', [approvedId])).rejects.toThrow(/append-only/);
  });
});

describe('superseding', () => {
  it('marks the older approved plan of the battery with an overlapping window superseded, in the same transaction', async () => {
    const older = await approve({ fromHour: 24, hours: 12 });
    const separate = await approve({ fromHour: 40, hours: 6 }); // 40..46: same battery, clear of the newer 30..38
    const elsewhere = await createPlace(planner);
    const otherBattery = await approve({ fromHour: 24, hours: 12 }, elsewhere);

    const newer = await insertDraftPlan(place, planner.user.id, { fromHour: 30, hours: 8 }); // 30..38 overlaps 24..36 only
    await planner.post(`/api/plans/${newer.id}/submit`).send({ version: 1 });
    const response = await approver.post(`/api/plans/${newer.id}/approve`).send({ version: 2 });
    expect(response.status).toBe(200);
    expect(response.body.supersededPlanIds).toEqual([older]);

    const rows = await sqlRows<{ id: string; status: string; superseded_by: string | null }>(
      'select id, status, superseded_by from plans where id = any($1)',
      [[older, separate, otherBattery, newer.id]],
    );
    const byId = new Map(rows.map((r) => [r.id, r]));
    expect(byId.get(older)).toMatchObject({ status: 'superseded', superseded_by: newer.id });
    expect(byId.get(separate)?.status).toBe('approved');
    expect(byId.get(otherBattery)?.status).toBe('approved');
    expect(byId.get(newer.id)?.status).toBe('approved');

    const history = await planner.get(`/api/plans/${older}/sign-off`);
    expect(history.body.events.map((e: { action: string }) => e.action)).toEqual(['submitted', 'approved', 'superseded']);
    expect(history.body).toMatchObject({ status: 'superseded', superseded: { byPlanId: newer.id }, checksumVerified: true });
    const audit = await sqlRows<{ action: string }>('select action from audit_events where entity_id = $1 order by id', [older]);
    expect(audit.map((a) => a.action)).toEqual(['plan.submitted', 'plan.approved', 'plan.superseded']);
  });

  it('keeps a superseded plan final: no UPDATE or DELETE', async () => {
    const [row] = await sqlRows<{ id: string }>("select id from plans where status = 'superseded' and battery_id = $1 limit 1", [
      place.batteryId,
    ]);
    expect(row).toBeDefined();
    await expect(sqlRows("update plans set status = 'approved' where id = $1", [row?.id])).rejects.toThrow(refused);
    await expect(sqlRows('delete from plans where id = $1', [row?.id])).rejects.toThrow(refused);
  });

  it('does not supersede a plan that only touches the window end to end', async () => {
    // Windows are half-open [start, end): 12..18 after 6..12 shares no interval.
    const first = await approve({ fromHour: 6, hours: 6 });
    const second = await approve({ fromHour: 12, hours: 6 });
    const rows = await sqlRows<{ id: string; status: string }>('select id, status from plans where id = any($1)', [
      [first, second],
    ]);
    expect(rows.map((r) => r.status)).toEqual(['approved', 'approved']);
  });
});
