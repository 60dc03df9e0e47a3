/**
 * The plan export as CSV: one row per interval of the delivery window. Column
 * names carry their units and are chosen so the export uploads back as a price
 * profile without edits: our profile parser picks `interval_start` as the time
 * column (its header words "interval" + "start" outscore "interval" + "end" for
 * interval-beginning labels, and it comes before `interval_start_utc`, which ties
 * with it) and the price column as the value column (its word "price" scores
 * highest, and it comes before the stored-energy value column, which would tie on
 * unit words). Times are RFC 3339 with the site's UTC offset at that instant, so
 * DST days read back unambiguously; `interval_start_utc` gives the same instant in UTC.
 *
 * Laid out for a spreadsheet as well as for a machine: column A says on every row
 * whether the schedule may be dispatched, B2 (first row, second column) holds the
 * cautions, then the schedule, and the plan's facts on the first row at the end.
 * Numbers have the decimals of their unit (kW and kWh 3, prices 2, % 2), never
 * the solver's rounding noise.
 */
import { createZoneClock, formatInstant, type ZoneClock } from '@shared/profile-csv';
import type { PlanStatus } from '@shared/schemas/sign-off';
import type { PowerSeries } from '../engine/types';
import { fixed, formatFixedCell, writeCsv, type CsvCell } from './csv-writer';

/** The value as the file writes it. */
const written = (value: number, decimals: number) => Number(formatFixedCell(value, decimals));

/** Decimals per unit: kW and kWh to the watt(-hour), money per MWh to the cent, % to a hundredth. */
export const DECIMALS = { power: 3, energy: 3, price: 2, percent: 2 } as const;

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
  /** The plan's facts for the first row (absent: the cell stays empty). */
  readonly batteryName?: string;
  readonly batteryVersion?: number;
  readonly deliveryStart?: string;
  readonly deliveryEnd?: string;
  readonly horizonHours?: number;
  readonly terminalRule?: string;
  /** RFC 3339 instant the file was made. */
  readonly exportedAt?: string;
}

export class ExportDataError extends Error {}

/** Column names, with the currency code filled in. */
export function exportColumns(currency: string): string[] {
  const c = currency.toLowerCase();
  return [
    // On every row, first, so a spreadsheet shows it before anything else.
    'plan_status',
    // The cautions, on the first row, where a spreadsheet opens (cell B2).
    'notice',
    'interval_start',
    'interval_end',
    'interval_start_utc',
    `price_${c}_per_mwh`,
    'charge_kw',
    'discharge_kw',
    'net_battery_power_kw_discharge_positive',
    'soc_end_kwh',
    'soc_end_pct',
    'grid_import_kw',
    'grid_export_kw',
    `stored_energy_value_${c}_per_mwh`,
    // Plan facts: on every row so a row copied elsewhere keeps its plan...
    'site',
    'plan_id',
    // ...and on the first row only, to keep the file small.
    'approved_by',
    'approved_at',
    'approval_comment',
    'checksum_sha256',
    'battery',
    'battery_version',
    'delivery_start',
    'delivery_end',
    'horizon_hours',
    'terminal_rule',
    'exported_at',
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

/** An RFC 3339 instant (or null) in the site's local time with its offset, like the intervals. */
function localInstant(iso: string | null | undefined, clock: ZoneClock): string | null {
  if (!iso) return null;
  const ms = Date.parse(iso);
  return Number.isFinite(ms) ? formatInstant(ms, clock) : null;
}

/** The first row's facts after the schedule, in the order of `exportColumns`. */
function firstRowFacts(meta: ExportMeta, clock: ZoneClock): CsvCell[] {
  return [
    meta.approvedBy,
    localInstant(meta.approvedAt, clock),
    meta.approvalComment,
    meta.checksum,
    meta.batteryName ?? null,
    meta.batteryVersion ?? null,
    localInstant(meta.deliveryStart, clock),
    localInstant(meta.deliveryEnd, clock),
    meta.horizonHours ?? null,
    meta.terminalRule ?? null,
    localInstant(meta.exportedAt, clock),
  ];
}

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
  const firstFacts = firstRowFacts(meta, clock);
  const noFacts = firstFacts.map(() => null);
  const rows: CsvCell[][] = [];
  for (let t = 0; t < n; t += 1) {
    const start = schedule.startMs + t * stepMs;
    const charge = schedule.chargeKw[t] ?? Number.NaN;
    const discharge = schedule.dischargeKw[t] ?? Number.NaN;
    const soc = schedule.socEndKwh[t] ?? Number.NaN;
    const facts = t === 0 ? firstFacts : null;
    rows.push([
      status,
      t === 0 ? meta.notice : null,
      formatInstant(start, clock),
      formatInstant(start + stepMs, clock),
      new Date(start).toISOString().replace('.000Z', 'Z'),
      fixed(schedule.priceCurrencyPerMwh[t], DECIMALS.price),
      fixed(charge, DECIMALS.power),
      fixed(discharge, DECIMALS.power),
      // From the written figures, so the row adds up exactly as it reads.
      fixed(written(discharge, DECIMALS.power) - written(charge, DECIMALS.power), DECIMALS.power),
      fixed(soc, DECIMALS.energy),
      schedule.energyKwh > 0 ? fixed((soc / schedule.energyKwh) * 100, DECIMALS.percent) : null,
      fixed(schedule.gridImportKw[t], DECIMALS.power),
      fixed(schedule.gridExportKw[t], DECIMALS.power),
      fixed(schedule.storedEnergyValue[t], DECIMALS.price),
      meta.siteName,
      meta.planId,
      ...(facts ?? noFacts),
    ]);
  }
  return writeCsv(exportColumns(schedule.currency), rows);
}
