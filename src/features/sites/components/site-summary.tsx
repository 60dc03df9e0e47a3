import type { Site } from '@shared/schemas/site';
import { formatNumber } from '@/lib/format';

const orNone = (value: number | null, unit: string) => (value === null ? 'none' : `${formatNumber(value, 2)} ${unit}`);

/** The site's settings as a definition list (the header of the site page). */
export function SiteSummary({ site }: { site: Site }) {
  const rows: [string, string][] = [
    ['Time zone', site.timezone],
    ['Import limit', orNone(site.importLimitKw, 'kW')],
    ['Export limit', orNone(site.exportLimitKw, 'kW')],
    ['Demand charge', orNone(site.demandChargePerKw, `${site.currency}/kW`)],
    ['Currency', site.currency],
    ['Default horizon', orNone(site.defaultHorizonHours, 'hours')],
  ];
  return (
    <dl className="grid grid-cols-2 gap-x-6 gap-y-2 rounded bg-white p-4 shadow-sm sm:grid-cols-3">
      {rows.map(([term, value]) => (
        <div key={term} className="min-w-0">
          <dt className="text-xs uppercase tracking-wide text-ink-500">{term}</dt>
          <dd className="font-medium break-words text-ink-900">{value}</dd>
        </div>
      ))}
    </dl>
  );
}
