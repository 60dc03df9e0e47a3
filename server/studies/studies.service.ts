/** Horizon studies: creation (snapshot, validation, job) and reading. */
import type { Study, StudyCreate, StudyCreated, StudyInputs, StudyListQuery } from '@shared/schemas/study';
import { terminalTargetPct } from '@shared/schemas/terminal-rule';
import { getDb } from '../db/client';
import { notFound } from '../http/app-error';
import type { Actor } from '../http/request-context';
import { createRunWithJob, runJob } from '../runs/create-run';
import { checkTerminalTarget, resolveInitialSoc } from '../runs/initial-soc';
import { checkWholeSteps, DEFAULT_BAND_PCT, gridStepMinutes, resolveRunInputs, runColumns } from '../runs/run-inputs';
import { findStudy, insertStudy, listStudies } from './studies.repo';
import { toStudy } from './study-serializer';

export async function createStudy(body: StudyCreate, actor: Actor, databaseUrl: string): Promise<StudyCreated> {
  const db = getDb();
  const run = await resolveRunInputs(db, {
    batteryId: body.batteryId,
    priceProfileId: body.priceProfileId,
    loadProfileId: body.loadProfileId,
    generationProfileId: body.generationProfileId,
    start: body.start,
    end: body.end,
    startField: 'start',
    endField: 'end',
    what: 'study period',
  });
  checkWholeSteps(
    [
      { hours: body.replanHours, path: 'replanHours', what: 're-plan interval' },
      ...body.horizonsHours.map((hours, i) => ({ hours, path: `horizonsHours.${i}`, what: 'horizon' })),
    ],
    gridStepMinutes(run.profiles),
  );
  body.terminalRules.forEach((rule, i) => checkTerminalTarget(run.battery, terminalTargetPct(rule), 'terminalRules', i));
  const soc = await resolveInitialSoc(db, run.battery, body.initialSocPct, body.start);
  const inputs: StudyInputs = {
    ...run,
    start: body.start.toISOString(),
    end: body.end.toISOString(),
    horizonsHours: [...body.horizonsHours].sort((a, b) => a - b),
    replanHours: body.replanHours,
    terminalRules: body.terminalRules,
    initialSocPct: soc.pct,
    initialSocSource: soc.source,
    bandPct: DEFAULT_BAND_PCT,
    steadyDays: body.steadyDays ?? 'all',
  };

  const { entityId: studyId, jobId } = await createRunWithJob({
    kind: 'study',
    actor,
    databaseUrl,
    insert: (tx, ids) =>
      insertStudy(tx, {
        id: ids.entityId,
        jobId: ids.jobId,
        ...runColumns(run),
        periodStart: body.start,
        periodEnd: body.end,
        horizonsHours: inputs.horizonsHours,
        replanHours: body.replanHours,
        terminalRules: body.terminalRules,
        initialSocPct: soc.pct,
        inputs,
        createdBy: actor.id,
      }),
    auditDetails: {
      batteryId: run.battery.id,
      start: inputs.start,
      end: inputs.end,
      horizonsHours: inputs.horizonsHours,
      replanHours: body.replanHours,
      terminalRules: body.terminalRules,
      steadyDays: inputs.steadyDays,
    },
  });
  const study = await getStudy(studyId);
  return { study, job: await runJob(jobId) };
}

export async function getStudy(id: string): Promise<Study> {
  const row = await findStudy(getDb(), id);
  if (!row) throw notFound('The horizon study');
  return toStudy(row, true);
}

export async function listStudySummaries(query: StudyListQuery): Promise<Study[]> {
  return (await listStudies(getDb(), query)).map((row) => toStudy(row, false));
}
