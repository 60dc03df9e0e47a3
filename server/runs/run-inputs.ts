/**
 * Turns the ids of a plan or study request into the inputs snapshot: the
 * battery and site parameters copied now (later edits never reach the run),
 * the profiles named by id and SHA-256. Every reason a request cannot run is
 * collected as an issue naming the field and how to fix it (422).
 */
import type { BatterySnapshot, ProfileRef, SiteSnapshot } from '@shared/schemas/plan';
import { batteryWarnings } from '@shared/schemas/battery-warnings';
import type { DbOrTx } from '../db/client';
import type { ErrorIssue } from '../http/app-error';
import { unprocessable } from '../http/app-error';
import { findBattery } from '../batteries/batteries.repo';
import { findSite } from '../sites/sites.repo';
import { findProfileSummary } from '../profiles/profiles.repo';

export interface RunRequest {
  batteryId: string;
  priceProfileId: string;
  loadProfileId?: string | null | undefined;
  generationProfileId?: string | null | undefined;
  /** The period the run must find data for (a plan's delivery window, a study's period). */
  start: Date;
  end: Date;
  /** Request field names of start and end, for issues. */
  startField: string;
  endField: string;
  what: string;
}

export interface RunInputs {
  battery: BatterySnapshot;
  site: SiteSnapshot;
  profiles: { price: ProfileRef; load: ProfileRef | null; generation: ProfileRef | null };
  warnings: string[];
}

/** Tolerance band around the steady cycle, % of usable energy (docs/model.md, the turnpike figures). */
export const DEFAULT_BAND_PCT = 5;

const MINUTE_MS = 60_000;
const iso = (d: Date) => d.toISOString().replace('.000Z', 'Z');

type Kind = ProfileRef['kind'];
type Summary = NonNullable<Awaited<ReturnType<typeof findProfileSummary>>>;

function profileRef(row: Summary): ProfileRef {
  const startMs = row.startAt.getTime();
  return {
    id: row.id,
    name: row.name,
    kind: row.kind,
    start: iso(row.startAt),
    end: iso(new Date(startMs + row.valueCount * row.stepMinutes * MINUTE_MS)),
    stepMinutes: row.stepMinutes,
    sha256: row.originalSha256,
  };
}

function checkPeriod(ref: ProfileRef, request: RunRequest, field: string, issues: ErrorIssue[]) {
  const from = Date.parse(ref.start);
  const to = Date.parse(ref.end);
  const startMs = request.start.getTime();
  const endMs = request.end.getTime();
  if (startMs < from || endMs > to) {
    issues.push({
      path: startMs < from ? request.startField : request.endField,
      message: `The ${request.what} ${iso(request.start)} – ${iso(request.end)} lies outside the period of the ${ref.kind} profile "${ref.name}" (${ref.start} – ${ref.end}). Choose times inside it, or pick another ${ref.kind} profile (${field}).`,
    });
    return;
  }
  const stepMs = ref.stepMinutes * MINUTE_MS;
  for (const [ms, name] of [
    [startMs, request.startField],
    [endMs, request.endField],
  ] as const) {
    if ((ms - from) % stepMs !== 0) {
      issues.push({
        path: name,
        message: `${name} must fall on a step of the ${ref.kind} profile "${ref.name}" (every ${ref.stepMinutes} minutes from ${ref.start}).`,
      });
    }
  }
}

export async function resolveRunInputs(db: DbOrTx, request: RunRequest): Promise<RunInputs> {
  const issues: ErrorIssue[] = [];
  const battery = await findBattery(db, request.batteryId);
  if (!battery)
    throw unprocessable('The battery was not found.', [
      { path: 'batteryId', message: `No battery has the id ${request.batteryId}. Choose one from the site's list.` },
    ]);
  const site = await findSite(db, battery.siteId);
  if (!site) throw new Error(`battery ${battery.id} has no site`);

  const wanted: [Kind, string, string | null | undefined][] = [
    ['price', 'priceProfileId', request.priceProfileId],
    ['load', 'loadProfileId', request.loadProfileId],
    ['generation', 'generationProfileId', request.generationProfileId],
  ];
  const refs: Record<Kind, ProfileRef | null> = { price: null, load: null, generation: null };
  for (const [kind, field, id] of wanted) {
    if (!id) continue;
    const row = await findProfileSummary(db, id);
    if (!row) {
      issues.push({ path: field, message: `No profile has the id ${id}. Choose a ${kind} profile of site "${site.name}".` });
    } else if (row.siteId !== site.id) {
      issues.push({
        path: field,
        message: `The profile "${row.name}" belongs to another site, not to "${site.name}" where the battery "${battery.name}" is. Choose a ${kind} profile of "${site.name}".`,
      });
    } else if (row.kind !== kind) {
      issues.push({
        path: field,
        message: `The profile "${row.name}" is a ${row.kind} profile; ${field} needs a ${kind} profile.`,
      });
    } else {
      refs[kind] = profileRef(row);
      checkPeriod(refs[kind], request, field, issues);
    }
  }
  if (issues.length > 0 || !refs.price)
    throw unprocessable(`The ${request.what} cannot be computed with these inputs: see issues.`, issues);

  const params = {
    powerChargeKw: battery.powerChargeKw,
    powerDischargeKw: battery.powerDischargeKw,
    energyKwh: battery.energyKwh,
    socMinPct: battery.socMinPct,
    socMaxPct: battery.socMaxPct,
    socInitialPct: battery.socInitialPct,
    efficiencyCharge: battery.efficiencyCharge,
    efficiencyDischarge: battery.efficiencyDischarge,
    selfDischargePctPerHour: battery.selfDischargePctPerHour,
    degradationCostPerMwh: battery.degradationCostPerMwh,
    maxCyclesPerDay: battery.maxCyclesPerDay,
  };
  const limits = { importLimitKw: site.importLimitKw, exportLimitKw: site.exportLimitKw };
  return {
    battery: { id: battery.id, name: battery.name, version: battery.version, ...params },
    site: {
      id: site.id,
      name: site.name,
      timezone: site.timezone,
      currency: site.currency,
      ...limits,
      demandChargePerKw: site.demandChargePerKw,
    },
    profiles: { price: refs.price, load: refs.load, generation: refs.generation },
    warnings: batteryWarnings(params, limits).map((w) => w.message),
  };
}

/** The grid step of a run: the finest step among its profiles (the engine aligns to it). */
export function gridStepMinutes(profiles: RunInputs['profiles']): number {
  return Math.min(...[profiles.price, profiles.load, profiles.generation].filter((p) => p !== null).map((p) => p.stepMinutes));
}

/** Durations must be whole steps of the grid; collects an issue for each that is not. */
export function checkWholeSteps(entries: readonly { hours: number; path: string; what: string }[], stepMinutes: number): void {
  const issues: ErrorIssue[] = [];
  for (const { hours, path, what } of entries) {
    const steps = (hours * 60) / stepMinutes;
    if (Math.abs(steps - Math.round(steps)) > 1e-9) {
      issues.push({
        path,
        message: `The ${what} of ${hours} h is not a whole number of ${stepMinutes}-minute steps of the profiles; use a multiple of ${stepMinutes} minutes.`,
      });
    }
  }
  if (issues.length > 0) throw unprocessable('A duration does not fit the profiles’ time step.', issues);
}

/** The columns plans and studies share: where the run comes from. */
export function runColumns(run: RunInputs) {
  return {
    siteId: run.site.id,
    batteryId: run.battery.id,
    priceProfileId: run.profiles.price.id,
    loadProfileId: run.profiles.load?.id ?? null,
    generationProfileId: run.profiles.generation?.id ?? null,
  };
}
