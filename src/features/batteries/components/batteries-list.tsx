import { Link } from 'react-router-dom';
import type { Battery } from '@shared/schemas/battery';
import { EmptyState, ErrorState, LoadingState } from '@/components/query-state';
import { ScrollRegion } from '@/components/scroll-region';
import { numClass, tableClass, tdClass, thClass, theadClass } from '@/components/table-classes';
import { formatEfficiency, formatNumber } from '@/lib/format';
import { useSiteBatteries } from '../api/get-site-batteries';

const fmt = (n: number) => formatNumber(n, 3);

function BatteryRow({ battery }: { battery: Battery }) {
  return (
    <tr className="border-t border-ink-100">
      <td className={tdClass}>
        <Link to={`/batteries/${battery.id}`} className="font-medium text-seaglass-700 underline-offset-2 hover:underline">
          {battery.name}
        </Link>
      </td>
      <td className={`${tdClass} ${numClass}`}>
        {fmt(battery.powerChargeKw)} / {fmt(battery.powerDischargeKw)} kW
      </td>
      <td className={`${tdClass} ${numClass}`}>{fmt(battery.energyKwh)} kWh</td>
      <td className={`${tdClass} ${numClass}`}>
        {fmt(battery.socMinPct)}–{fmt(battery.socMaxPct)} %
      </td>
      <td className={`${tdClass} ${numClass}`}>{formatEfficiency(battery.efficiencyCharge * battery.efficiencyDischarge)}</td>
      <td className={tdClass}>
        {battery.warnings.length > 0 ? (
          <span
            className="rounded bg-amber-100 px-2 py-0.5 whitespace-nowrap text-ink-900"
            title={battery.warnings.map((w) => w.message).join('\n')}
          >
            {battery.warnings.length} to check
          </span>
        ) : (
          <span className="text-ink-500">none</span>
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
    <ScrollRegion label="Batteries table (scrolls sideways)">
      <table className={tableClass}>
        <caption className="sr-only">Batteries</caption>
        <thead className={theadClass}>
          <tr>
            <th scope="col" className={thClass}>
              Battery
            </th>
            <th scope="col" className={`${thClass} ${numClass}`}>
              Charge / discharge
            </th>
            <th scope="col" className={`${thClass} ${numClass}`}>
              Energy
            </th>
            <th scope="col" className={`${thClass} ${numClass}`}>
              SoC window
            </th>
            <th scope="col" className={`${thClass} ${numClass}`}>
              Round-trip efficiency
            </th>
            <th scope="col" className={thClass}>
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
    </ScrollRegion>
  );
}
