/**
 * Recomputes the checksum of every signed-off plan (approved or superseded)
 * and compares it with the stored one: after a restore, and for an
 * administrator who wants to know that nothing was changed behind the
 * application's back (README, "Backup and restore").
 */
import type { DbOrTx } from '../db/client';
import { checksumMatches } from './plan-checksum';
import { pageSignedOffPlans } from '../plans/plans.repo';

export interface ChecksumReport {
  checked: number;
  verified: number;
  mismatches: { planId: string; status: string; reason: string }[];
}

export async function verifySignedOffPlans(db: DbOrTx, pageSize = 50): Promise<ChecksumReport> {
  const report: ChecksumReport = { checked: 0, verified: 0, mismatches: [] };
  let after: string | null = null;
  for (;;) {
    const page = await pageSignedOffPlans(db, after, pageSize);
    for (const plan of page) {
      report.checked += 1;
      if (!plan.checksum) report.mismatches.push({ planId: plan.id, status: plan.status, reason: 'no checksum is stored' });
      else if (!checksumMatches(plan.checksum, { planId: plan.id, inputs: plan.inputs, results: plan.results })) {
        report.mismatches.push({
          planId: plan.id,
          status: plan.status,
          reason: 'the stored inputs or results no longer match the checksum taken at approval',
        });
      } else report.verified += 1;
    }
    const last = page.at(-1);
    if (!last || page.length < pageSize) return report;
    after = last.id;
  }
}
