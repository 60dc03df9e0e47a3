import type { PlanResults } from '@shared/schemas/plan';
import { formatMoney, formatNumber } from '@/lib/format';

function Figure({ label, value, note }: { label: string; value: string; note?: string }) {
  return (
    <div className="rounded border border-ink-100 bg-white p-3">
      <dt className="text-xs font-medium uppercase tracking-wide text-ink-500">{label}</dt>
      <dd className="mt-1 text-xl font-semibold tabular-nums text-ink-900">{value}</dd>
      {note && <dd className="text-xs text-ink-500">{note}</dd>}
    </div>
  );
}

/** Cost, earnings, equivalent cycles, peak import over the delivery window. */
export function PlanSummaryCard({ results, currency }: { results: PlanResults; currency: string }) {
  const s = results.summary;
  return (
    <dl className="grid gap-3 sm:grid-cols-2 lg:grid-cols-5">
      <Figure label="Cost" value={formatMoney(s.cost, currency)} note="paid over the delivery window (negative: net earnings)" />
      <Figure label="Earnings" value={formatMoney(s.earnings, currency)} note="against the same site without the battery" />
      <Figure
        label="Equivalent cycles"
        value={formatNumber(s.equivalentCycles, 2)}
        note={`${formatNumber(s.dischargedKwh, 0)} kWh discharged`}
      />
      <Figure label="Peak import" value={`${formatNumber(s.peakImportKw, 0)} kW`} />
      <Figure
        label="End SoC"
        value={`${formatNumber(s.endSocPct, 1)} %`}
        note={results.steadyCycle ? `steady cycle: ${formatMoney(results.steadyCycle.costPerDay, currency)} per day` : undefined}
      />
    </dl>
  );
}
