/**
 * The demo scenario `npm start` loads, run the way it runs it (scripts/prepare-demo.ts
 * in its own process): on a fresh database it holds plans in every state of the
 * sign-off and a finished horizon study, computed through the real job path; the
 * process exits by itself (nothing left open); a second load adds nothing.
 */
import { spawn } from 'node:child_process';
import { afterAll, describe, expect, it } from 'vitest';
import type pg from 'pg';
import { scratchDatabase, sqlAt } from '../support/scratch-database';

const scratch = scratchDatabase('demo');
const scratchUrl = scratch.url;
const query = <T extends pg.QueryResultRow>(text: string) => sqlAt<T>(scratchUrl, text);

interface PlanRow {
  id: string;
  status: string;
  horizon_hours: number;
  terminal_rule: string;
  initial_soc_pct: number;
  source: string;
  soc_plan: string | null;
  end_soc: number | null;
  checksum: string | null;
  submitted_by: string | null;
  approved_by: string | null;
  day: string;
}

const plansQuery = `
  select id, status, horizon_hours, terminal_rule, initial_soc_pct, inputs->>'initialSocSource' as source,
         inputs->>'initialSocPlanId' as soc_plan, (results->'summary'->>'endSocPct')::float8 as end_soc, checksum,
         submitted_by, approved_by, to_char(delivery_start at time zone 'Europe/Berlin', 'YYYY-MM-DD') as day
  from plans order by delivery_start, horizon_hours, terminal_rule`;

/** Runs the demo preparation as `npm start` does; rejects if it fails or is still running after `limitMs`. */
function prepareDemo(limitMs = 150_000): Promise<string> {
  return new Promise((resolve, reject) => {
    const child = spawn(process.execPath, ['--import', 'tsx', 'scripts/prepare-demo.ts'], {
      env: { ...process.env, DATABASE_URL: scratchUrl, LOG_LEVEL: 'error' },
      stdio: ['ignore', 'pipe', 'pipe'],
    });
    let output = '';
    child.stdout.on('data', (d: Buffer) => (output += d.toString()));
    child.stderr.on('data', (d: Buffer) => (output += d.toString()));
    // Not a speed check: a process that never exits (an open server or timer) would hang `npm start` and `npm test`.
    const guard = setTimeout(() => {
      child.kill('SIGKILL');
      reject(new Error(`the demo preparation had not exited after ${limitMs / 1000} s; something kept it open:\n${output}`));
    }, limitMs);
    child.on('exit', (code) => {
      clearTimeout(guard);
      if (code === 0) resolve(output);
      else reject(new Error(`the demo preparation failed (${code}):\n${output}`));
    });
  });
}

describe('the demo scenario', () => {
  afterAll(async () => {
    await scratch.drop();
  });

  it('holds an approved plan, the next day awaiting sign-off from its end SoC, four horizons of one Sunday and a finished study; the process exits; a second load adds nothing', async () => {
    expect(await prepareDemo()).toMatch(
      /Demo plans \(approved, awaiting sign-off, four horizons of one Sunday\) and a horizon study computed/,
    );
    const plans = await query<PlanRow>(plansQuery);
    expect(plans.map((p) => [p.day, p.status, p.horizon_hours, p.terminal_rule])).toEqual([
      ['2026-12-04', 'approved', 48, 'steady-value'],
      ['2026-12-05', 'submitted', 48, 'steady-value'],
      ['2026-12-06', 'draft', 24, 'free'],
      ['2026-12-06', 'draft', 24, 'steady-value'],
      ['2026-12-06', 'draft', 48, 'steady-value'],
      ['2026-12-06', 'draft', 168, 'steady-value'],
    ]);
    const [approved, today, shortFree] = plans;
    // Sign-off is segregation of duties (SECURITY.md, ASVS 4.0.3 4.3.3): another person approved, with a SHA-256 checksum.
    expect(approved!.checksum).toMatch(/^[0-9a-f]{64}$/);
    expect(approved!.approved_by).not.toBe(approved!.submitted_by);
    // The next day starts from the approved schedule's end SoC (the plan form's default rule).
    expect(today).toMatchObject({ source: 'last-approved-plan', soc_plan: approved!.id });
    expect(today!.initial_soc_pct).toBeCloseTo(approved!.end_soc!, 9);
    // [D] A free end values nothing left after the horizon, so with positive prices the
    // battery is emptied to its minimum SoC by the end of a 24 h horizon (the leaving arc).
    const [battery] = await query<{ soc_min_pct: number }>('select soc_min_pct from batteries');
    expect(shortFree!.end_soc).toBeCloseTo(battery!.soc_min_pct, 6);
    // The Sunday was chosen so the horizons differ: the 168 h plan keeps energy for Monday morning.
    expect(plans[5]!.end_soc!).toBeGreaterThan(shortFree!.end_soc! + 5);

    const studies = await query<{ state: string; runs: number }>(
      `select j.state, jsonb_array_length(s.results->'runs') as runs from horizon_studies s join job_progress j on j.job_id = s.job_id`,
    );
    // [D] Six horizons times two terminal rules.
    expect(studies).toEqual([{ state: 'completed', runs: 12 }]);
    const mail = await query<{ to: string; subject: string }>('select "to", subject from mail_outbox order by id');
    expect(
      mail.filter((m) => m.to === 'approver@slackwater.example' && /^Plan awaiting your sign-off/.test(m.subject)),
    ).toHaveLength(2);

    expect(await prepareDemo()).toMatch(/Demo plans present/);
    expect(await query<PlanRow>(plansQuery)).toEqual(plans);
    expect(await query('select id from horizon_studies')).toHaveLength(1);
  }, 360_000);
});
