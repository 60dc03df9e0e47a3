import type { PlanResults } from '@shared/schemas/plan';
import { formatFixed, formatMoney } from '@/lib/format';

function Figure({ label, value, notes }: { label: string; value: string; notes: (string | undefined)[] }) {
  return (
    <div className="rounded border border-ink-100 bg-white p-3">
      <dt className="text-xs font-medium uppercase tracking-wide text-ink-500">{label}</dt>
      <dd className="mt-1 text-xl font-semibold tabular-nums text-ink-900">{value}</dd>
      {notes.filter(Boolean).map((note) => (
        <dd key={note} className="text-xs text-ink-500">
          {note}
        </dd>
      ))}
    </div>
  );
}

export interface PlanSummaryCardProps {
  results: PlanResults;
  currency: string;
  /** Nameplate energy, kWh (SoC % is of nameplate). */
  energyKwh: number;
  initialSocPct: number;
  /** The battery's SoC window, %, when known. */
  socWindow: [number, number] | null;
}

/** Cost, earnings, equivalent cycles, peak import and the SoC the delivery window ends with. */
export function PlanSummaryCard({ results, currency, energyKwh, initialSocPct, socWindow }: PlanSummaryCardProps) {
  const s = results.summary;
  const last = results.steps[results.deliverySteps - 1];
  const steadyEndPct = last?.steadySocKwh != null ? (last.steadySocKwh / energyKwh) * 100 : null;
  return (
    <dl className="grid gap-3 sm:grid-cols-2 lg:grid-cols-5">
      <Figure
        label="Cost"
        value={formatMoney(s.cost, currency)}
        notes={[
          'paid over the delivery window (negative: net earnings)',
          results.steadyCycle ? `steady cycle: ${formatMoney(results.steadyCycle.costPerDay, currency)} per day` : undefined,
        ]}
      />
      <Figure label="Earnings" value={formatMoney(s.earnings, currency)} notes={['against the same site without the battery']} />
      <Figure
        label="Equivalent cycles"
        value={formatFixed(s.equivalentCycles, 2)}
        notes={[`${formatFixed(s.dischargedKwh, 0)} kWh discharged`]}
      />
      <Figure label="Peak import" value={`${formatFixed(s.peakImportKw, 0)} kW`} notes={['highest grid import in the window']} />
      <Figure
        label="End SoC"
        value={`${formatFixed(s.endSocPct, 1)} %`}
        notes={[
          `${formatFixed((s.endSocPct / 100) * energyKwh, 0)} kWh at the window's end; started at ${formatFixed(initialSocPct, 1)} %`,
          steadyEndPct !== null ? `the steady cycle is at ${formatFixed(steadyEndPct, 1)} % then` : undefined,
          socWindow ? `SoC window ${formatFixed(socWindow[0], 0)}–${formatFixed(socWindow[1], 0)} %` : undefined,
        ]}
      />
    </dl>
  );
}
