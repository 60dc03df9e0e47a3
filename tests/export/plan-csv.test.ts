/**
 * The plan export's rows, columns and markings, and its round trip through our
 * own profile parser (its upload rules). Expected instants
 * are RFC 3339 literals read with Date.parse, independent of the exporter.
 */
import Papa from 'papaparse';
import { describe, expect, it } from 'vitest';
import { parseProfileCsv } from '@shared/profile-csv';
import { exportFileName } from '../../server/export/export-file-name';
import { planCsv, type ExportMeta, type ExportSchedule } from '../../server/export/plan-csv';

const BERLIN = 'Europe/Berlin';
const at = (iso: string) => Date.parse(iso);

/** The spring DST day in Berlin: 23 hourly intervals from local midnight (+01:00) [S: Directive 2000/84/EC, Art. 2]. */
function springDay(): ExportSchedule {
  const n = 23;
  const price = Array.from({ length: n }, (_, i) => [12.5, -7.25, 0, 88.125, 1e-7][i % 5] as number);
  return {
    timezone: BERLIN,
    currency: 'EUR',
    startMs: at('2026-03-28T23:00:00Z'),
    stepMinutes: 60,
    energyKwh: 4000,
    priceCurrencyPerMwh: price,
    chargeKw: price.map((p) => (p <= 0 ? 1000 : 0)),
    dischargeKw: price.map((p) => (p > 50 ? 810 : 0)),
    socEndKwh: price.map((_, i) => 400 + 100 * i),
    gridImportKw: price.map((p) => (p <= 0 ? 1000 : 0)),
    gridExportKw: price.map((p) => (p > 50 ? 810 : 0)),
    storedEnergyValue: price.map((_, i) => (i === 3 ? null : 40 + i)),
  };
}

const meta = (over: Partial<ExportMeta> = {}): ExportMeta => ({
  siteName: 'Harbour Road',
  planId: '5b1d3c9a-0000-4000-8000-00000000000a',
  status: 'approved',
  approvedBy: 'Ada Approver',
  approvedAt: '2026-03-27T16:00:00Z',
  approvalComment: 'Fine for tomorrow.',
  checksum: 'ab'.repeat(32),
  notice: 'Decision support only.',
  ...over,
});

const rowsOf = (text: string) =>
  Papa.parse<Record<string, string>>(text, { header: true, newline: '\r\n', skipEmptyLines: true }).data;

describe('plan CSV export', () => {
  it('writes one row per delivery interval with local times and offsets across the DST change', () => {
    const rows = rowsOf(planCsv(springDay(), meta()));
    expect(rows).toHaveLength(23);
    // [S: Directive 2000/84/EC] clocks go from 02:00 CET to 03:00 CEST at 01:00 UTC.
    expect(rows[0]?.interval_start).toBe('2026-03-29T00:00:00+01:00');
    expect(rows[1]?.interval_start).toBe('2026-03-29T01:00:00+01:00');
    expect(rows[1]?.interval_end).toBe('2026-03-29T03:00:00+02:00');
    expect(rows[2]?.interval_start).toBe('2026-03-29T03:00:00+02:00');
    expect(rows[22]?.interval_end).toBe('2026-03-30T00:00:00+02:00');
    for (const row of rows) expect(Date.parse(row.interval_end ?? '') - Date.parse(row.interval_start ?? '')).toBe(3_600_000);
  });

  it('derives net power and SoC % from the series, units in the column names', () => {
    const rows = rowsOf(planCsv(springDay(), meta()));
    const r1 = rows[1] ?? {};
    // [D] net = discharge - charge = 0 - 1000; SoC % = 500 / 4000 * 100; kW and kWh with 3 decimals, % with 2.
    expect(Number(r1.net_battery_power_kw_discharge_positive)).toBe(-1000);
    expect(r1.net_battery_power_kw_discharge_positive).toBe('-1000.000');
    expect(Number(r1.soc_end_kwh)).toBe(500);
    expect(r1.soc_end_kwh).toBe('500.000');
    expect(Number(r1.soc_end_pct)).toBe(12.5);
    expect(r1.soc_end_pct).toBe('12.50');
    expect(r1.price_eur_per_mwh).toBe('-7.25');
    expect(rows[3]?.stored_energy_value_eur_per_mwh).toBe('');
    expect(Object.keys(r1)).toContain('grid_import_kw');
  });

  it('marks every row with the status and writes approval facts on the first row only', () => {
    const rows = rowsOf(planCsv(springDay(), meta()));
    expect(rows.every((r) => r.plan_status === 'approved')).toBe(true);
    expect(rows[0]?.checksum_sha256).toBe('ab'.repeat(32));
    expect(rows[0]?.approved_by).toBe('Ada Approver');
    expect(rows[1]?.checksum_sha256).toBe('');
    const draft = rowsOf(planCsv(springDay(), meta({ status: 'draft', approvedBy: null, checksum: null })));
    expect(draft.every((r) => r.plan_status === 'draft: NOT APPROVED, do not dispatch')).toBe(true);
  });

  it('guards user-written text (site name, names, comment) but never a number', () => {
    const text = planCsv(
      springDay(),
      meta({ siteName: '=HYPERLINK("http://x.example")', approvedBy: '@boss', approvalComment: '-1+1' }),
    );
    const rows = rowsOf(text);
    // [S: OWASP CSV Injection; ASVS 5.0.0 1.2.10]
    expect(rows[0]?.site).toBe(`'=HYPERLINK("http://x.example")`);
    expect(rows[0]?.approved_by).toBe("'@boss");
    expect(rows[0]?.approval_comment).toBe("'-1+1");
    expect(rows[1]?.price_eur_per_mwh).toBe('-7.25');
  });

  it('uploads back as a price profile through our parser, values exact, interval-beginning', () => {
    const schedule = springDay();
    const result = parseProfileCsv(planCsv(schedule, meta()), { kind: 'price', unit: 'currency/MWh', timezone: BERLIN });
    if (!result.ok) throw new Error(JSON.stringify(result.issues));
    expect(result.profile.startMs).toBe(schedule.startMs);
    expect(result.profile.stepMinutes).toBe(60);
    // [D] the file writes prices to the cent (88.125 → 88.13, 1e-7 → 0.00), and those figures come back exactly.
    expect(result.profile.values).toEqual(schedule.priceCurrencyPerMwh.map((v) => Math.round(v * 100) / 100 || 0));
    expect(result.profile.notes.join(' ')).toMatch(/Times from "interval_start".*values from "price_eur_per_mwh"/);
  });

  it('uploads back the same series when read with interval-ending labels (the end column is picked)', () => {
    const schedule = springDay();
    const result = parseProfileCsv(planCsv(schedule, meta()), {
      kind: 'price',
      unit: 'currency/MWh',
      timezone: BERLIN,
      intervalEnding: true,
    });
    if (!result.ok) throw new Error(JSON.stringify(result.issues));
    expect(result.profile.startMs).toBe(schedule.startMs);
    expect(result.profile.notes.join(' ')).toMatch(/Times from "interval_end"/);
  });

  it('names the file after site, window, plan, status and, once approved, the checksum', () => {
    const base = {
      siteName: 'Hafen Süd / Pier 3',
      timezone: BERLIN,
      startMs: at('2026-03-28T23:00:00Z'),
      endMs: at('2026-03-29T22:00:00Z'),
      planId: 'p1',
    };
    // The window as its local start and its length: the spring DST day is 23 hours [S: Directive 2000/84/EC, Art. 2].
    expect(exportFileName({ ...base, status: 'approved', checksum: 'ab'.repeat(32) })).toBe(
      'slackwater_hafen-sud-pier-3_2026-03-29T0000+0100_23h_plan-p1_approved.csv',
    );
    expect(exportFileName({ ...base, status: 'draft', checksum: null })).toBe(
      'slackwater_hafen-sud-pier-3_2026-03-29T0000+0100_23h_plan-p1_draft-NOT-APPROVED.csv',
    );
  });

  it('refuses series whose length differs from the window, instead of shifting rows', () => {
    const broken = { ...springDay(), chargeKw: [0] };
    expect(() => planCsv(broken, meta())).toThrow(/chargeKw series has 1 entries but the delivery window has 23/);
  });

  it('keeps every file name under 100 characters, the checksum in the file instead', () => {
    const longest = exportFileName({
      siteName: 'Harbourside Depot and Container Terminal, North Quay',
      timezone: 'America/St_Johns',
      startMs: at('2026-01-01T00:00:00-03:30'),
      endMs: at('2027-01-01T00:00:00-03:30'),
      planId: '5b1d3c9a-0000-4000-8000-00000000000a',
      status: 'submitted',
      checksum: 'ab'.repeat(32),
    });
    expect(longest).toBe('slackwater_harbourside-depot_2026-01-01T0000-0330_8760h_plan-5b1d3c9a_submitted-NOT-APPROVED.csv');
    expect(longest.length).toBeLessThan(100);
    expect(rowsOf(planCsv(springDay(), meta()))[0]?.checksum_sha256).toBe('ab'.repeat(32));
  });

  it("writes kW and kWh with 3 decimals, prices with 2 and % with 2, never the solver's rounding noise", () => {
    const noisy = { ...springDay(), chargeKw: springDay().chargeKw.map((c, i) => (i === 0 ? 1387.4999999999998 : c)) };
    const text = planCsv(noisy, meta());
    expect(text).not.toMatch(/\d\.\d*9999|\d\.\d*0000\d/);
    const [first, second] = rowsOf(text);
    // [D] 1387.4999999999998 kW is 1387.500 kW to the watt; net = 0 − 1387.500.
    expect(first?.charge_kw).toBe('1387.500');
    expect(first?.net_battery_power_kw_discharge_positive).toBe('-1387.500');
    expect(first?.price_eur_per_mwh).toBe('12.50');
    expect(first?.stored_energy_value_eur_per_mwh).toBe('40.00');
    expect(second?.price_eur_per_mwh).toBe('-7.25');
    for (const row of rowsOf(text)) {
      for (const column of ['charge_kw', 'discharge_kw', 'soc_end_kwh', 'grid_import_kw', 'grid_export_kw'])
        expect(row[column]).toMatch(/^-?\d+\.\d{3}$/);
      expect(row.soc_end_pct).toMatch(/^-?\d+\.\d{2}$/);
    }
  });

  it("gives each interval's start in UTC too, and the approval time with the site's offset", () => {
    const rows = rowsOf(planCsv(springDay(), meta({ approvedAt: '2026-03-27T16:00:00Z' })));
    // [S: Directive 2000/84/EC] 2026-03-29T03:00+02:00 is 01:00 UTC; 27 March is still winter time (+01:00).
    expect(rows[2]?.interval_start_utc).toBe('2026-03-29T01:00:00Z');
    expect(rows.every((r) => Date.parse(r.interval_start_utc ?? '') === Date.parse(r.interval_start ?? ''))).toBe(true);
    expect(rows[0]?.approved_at).toBe('2026-03-27T17:00:00+01:00');
  });

  it('puts the status in column A of every row and the cautions in B2, where a spreadsheet opens', () => {
    const text = planCsv(
      springDay(),
      meta({ batteryName: 'Unit 1', batteryVersion: 2, horizonHours: 48, terminalRule: 'steady-value' }),
    );
    const header = text.split('\r\n')[0]?.split(',') ?? [];
    expect(header.slice(0, 3)).toEqual(['plan_status', 'notice', 'interval_start']);
    const [first, second] = rowsOf(text);
    expect(first?.notice).toBe('Decision support only.');
    expect(second?.notice).toBe('');
    expect(first).toMatchObject({ battery: 'Unit 1', battery_version: '2', horizon_hours: '48', terminal_rule: 'steady-value' });
    expect(second?.battery).toBe('');
  });
});
