/**
 * The plan export as CSV (issue 7): one row per interval of the delivery
 * window. Column names carry their units and are chosen so the export uploads
 * back as a price profile without edits: our profile parser picks
 * `interval_start` as the time column (its header words "interval" + "start"
 * outscore "interval" + "end" for interval-beginning labels) and the price
 * column as the value column (its word "price" scores highest, and it comes
 * before the stored-energy value column, which would tie on unit words).
 * Times are RFC 3339 with the site's UTC offset at that instant, so DST days
 * read back unambiguously.
 */
import { createZoneClock, formatInstant } from '@shared/profile-csv';
import type { PlanStatus } from '@shared/schemas/sign-off';
import type { PowerSeries } from '../engine/types';
import { writeCsv, type CsvCell } from './csv-writer';

/** The power series (one entry per delivery interval) are the engine's own. */
export interface ExportSchedule extends PowerSeries {
  /** IANA zone of the site. */
  readonly timezone: string;
  /** ISO 4217 code of the site's currency, e.g. EUR. */
  readonly currency: string;
  /** Start of the first delivery interval, UTC epoch ms. */
  readonly startMs: number;
  readonly stepMinutes: number;
  /** Nameplate energy of the battery, kWh (SoC % is of nameplate, DESIGN section 2). */
  readonly energyKwh: number;
  /** One entry per delivery interval. */
  readonly priceCurrencyPerMwh: readonly number[];
  /** Energy stored at the end of each interval, kWh. */
  readonly socEndKwh: readonly number[];
  /** Stored-energy value at the end of each interval, currency/MWh. */
  readonly storedEnergyValue: readonly (number | null)[];
}

/** Who and what the file is about. Text here is user-written (names, comments): the CSV writer guards it. */
export interface ExportMeta {
  readonly siteName: string;
  readonly planId: string;
  readonly status: PlanStatus;
  readonly approvedBy: string | null;
  /** RFC 3339 instant of the approval, or null. */
  readonly approvedAt: string | null;
  readonly approvalComment: string | null;
  readonly checksum: string | null;
  /** The cautions and, for anything not approved, "NOT APPROVED". */
  readonly notice: string;
}

export class ExportDataError extends Error {}

/** Column names, with the currency code filled in. */
export function exportColumns(currency: string): string[] {
  const c = currency.toLowerCase();
  return [
    'interval_start',
    'interval_end',
    `price_${c}_per_mwh`,
    'charge_kw',
    'discharge_kw',
    'net_battery_power_kw_discharge_positive',
    'soc_end_kwh',
    'soc_end_pct',
    'grid_import_kw',
    'grid_export_kw',
    `stored_energy_value_${c}_per_mwh`,
    // Plan facts: on every row so a row copied elsewhere keeps its status...
    'site',
    'plan_id',
    'plan_status',
    // ...and on the first row only, to keep the file small.
    'approved_by',
    'approved_at',
    'approval_comment',
    'checksum_sha256',
    'notice',
  ];
}

/** What the `plan_status` cell says; anything but an approved plan says NOT APPROVED in capitals. */
export function statusCell(status: PlanStatus): string {
  switch (status) {
    case 'approved':
      return 'approved';
    case 'superseded':
      return 'superseded: NOT CURRENT, a newer approved plan replaces it';
    default:
      return `${status}: NOT APPROVED, do not dispatch`;
  }
}

const SERIES: readonly (keyof ExportSchedule)[] = [
  'priceCurrencyPerMwh',
  'chargeKw',
  'dischargeKw',
  'socEndKwh',
  'gridImportKw',
  'gridExportKw',
  'storedEnergyValue',
];

export function planCsv(schedule: ExportSchedule, meta: ExportMeta): string {
  const clock = createZoneClock(schedule.timezone);
  if (clock === null) throw new ExportDataError(`The site's time zone "${schedule.timezone}" is unknown; correct the site.`);
  const n = schedule.priceCurrencyPerMwh.length;
  for (const key of SERIES) {
    const length = (schedule[key] as readonly unknown[]).length;
    if (length !== n)
      throw new ExportDataError(`The plan's ${key} series has ${length} entries but the delivery window has ${n} intervals.`);
  }
  const stepMs = schedule.stepMinutes * 60_000;
  const status = statusCell(meta.status);
  const rows: CsvCell[][] = [];
  for (let t = 0; t < n; t += 1) {
    const start = schedule.startMs + t * stepMs;
    const charge = schedule.chargeKw[t] ?? Number.NaN;
    const discharge = schedule.dischargeKw[t] ?? Number.NaN;
    const soc = schedule.socEndKwh[t] ?? Number.NaN;
    rows.push([
      formatInstant(start, clock),
      formatInstant(start + stepMs, clock),
      schedule.priceCurrencyPerMwh[t] ?? null,
      charge,
      discharge,
      discharge - charge,
      soc,
      schedule.energyKwh > 0 ? (soc / schedule.energyKwh) * 100 : null,
      schedule.gridImportKw[t] ?? null,
      schedule.gridExportKw[t] ?? null,
      schedule.storedEnergyValue[t] ?? null,
      meta.siteName,
      meta.planId,
      status,
      ...(t === 0
        ? [meta.approvedBy, meta.approvedAt, meta.approvalComment, meta.checksum, meta.notice]
        : [null, null, null, null, null]),
    ]);
  }
  return writeCsv(exportColumns(schedule.currency), rows);
}
