import { Link } from 'react-router-dom';
import type { Battery } from '@shared/schemas/battery';
import { EmptyState, ErrorState, LoadingState } from '@/components/query-state';
import { useSiteBatteries } from '../api/get-site-batteries';

const fmt = (n: number) => n.toLocaleString(undefined, { maximumFractionDigits: 3 });

function BatteryRow({ battery }: { battery: Battery }) {
  return (
    <tr className="border-t border-ink-100">
      <td className="px-3 py-2">
        <Link to={`/batteries/${battery.id}`} className="font-medium text-seaglass-700 underline-offset-2 hover:underline">
          {battery.name}
        </Link>
      </td>
      <td className="px-3 py-2 tabular-nums">
        {fmt(battery.powerChargeKw)} / {fmt(battery.powerDischargeKw)} kW
      </td>
      <td className="px-3 py-2 tabular-nums">{fmt(battery.energyKwh)} kWh</td>
      <td className="px-3 py-2 tabular-nums">
        {fmt(battery.socMinPct)}–{fmt(battery.socMaxPct)} %
      </td>
      <td className="px-3 py-2 tabular-nums">{(battery.efficiencyCharge * battery.efficiencyDischarge * 100).toFixed(1)} %</td>
      <td className="px-3 py-2">
        {battery.warnings.length > 0 ? (
          <span
            className="rounded bg-amber-100 px-2 py-0.5 text-sm text-ink-900"
            title={battery.warnings.map((w) => w.message).join('\n')}
          >
            {battery.warnings.length} to check
          </span>
        ) : (
          <span className="text-sm text-ink-500">none</span>
        )}
      </td>
    </tr>
  );
}

export function BatteriesList({ siteId }: { siteId: string }) {
  const batteries = useSiteBatteries(siteId);
  if (batteries.isPending) return <LoadingState label="Loading batteries…" />;
  if (batteries.isError) return <ErrorState error={batteries.error} onRetry={() => void batteries.refetch()} />;
  if (batteries.data.length === 0) return <EmptyState title="No batteries at this site yet." />;
  return (
    <table className="w-full rounded bg-white text-left shadow-sm">
      <caption className="sr-only">Batteries</caption>
      <thead className="bg-ink-100 text-sm text-ink-700">
        <tr>
          <th scope="col" className="px-3 py-2">
            Battery
          </th>
          <th scope="col" className="px-3 py-2">
            Charge / discharge
          </th>
          <th scope="col" className="px-3 py-2">
            Energy
          </th>
          <th scope="col" className="px-3 py-2">
            SoC window
          </th>
          <th scope="col" className="px-3 py-2">
            Round trip
          </th>
          <th scope="col" className="px-3 py-2">
            Warnings
          </th>
        </tr>
      </thead>
      <tbody>
        {batteries.data.map((b) => (
          <BatteryRow key={b.id} battery={b} />
        ))}
      </tbody>
    </table>
  );
}
