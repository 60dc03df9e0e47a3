import type { Study, StudyRecommendation } from '@shared/schemas/study';
import { runJobOf } from '../runs/create-run';
import type { RunJobRow } from '../runs/run-columns';
import type { HorizonStudyRow } from './studies.schema';

interface JoinedRow {
  study: Omit<HorizonStudyRow, 'results' | 'inputs'> & Partial<Pick<HorizonStudyRow, 'results' | 'inputs'>>;
  siteName: string | null;
  batteryName: string | null;
  createdByName: string | null;
  job: RunJobRow | null;
  recommendation?: StudyRecommendation | null;
}

export function toStudy(row: JoinedRow, detail: boolean): Study {
  const s = row.study;
  const job = runJobOf(row.job);
  const method = s.method === 'dp' || s.method === 'lp' || s.method === 'mixed' ? s.method : null;
  const study: Study = {
    id: s.id,
    siteId: s.siteId,
    siteName: row.siteName,
    batteryId: s.batteryId,
    batteryName: row.batteryName,
    start: s.periodStart.toISOString(),
    end: s.periodEnd.toISOString(),
    horizonsHours: s.horizonsHours,
    replanHours: s.replanHours,
    terminalRules: s.terminalRules,
    initialSocPct: s.initialSocPct,
    createdBy: { id: s.createdBy, name: row.createdByName },
    createdAt: s.createdAt.toISOString(),
    status: job?.state ?? 'queued',
    method,
    errorMessage: s.errorMessage,
    job,
  };
  if (detail) {
    if (s.inputs) study.inputs = s.inputs;
    study.results = s.results ?? null;
  } else {
    study.recommendation = row.recommendation ?? null;
  }
  return study;
}
