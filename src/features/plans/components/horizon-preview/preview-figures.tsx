/** What the preview changes: cost against the plan, the decision horizon, the turnpike flags, how long it took. */
import { Link } from 'react-router-dom';
import type { HorizonPreview } from '@shared/schemas/horizon-preview';
import { formatMoney, formatNumber, formatPercent } from '@/lib/format';
import { FactList } from '../fact-list';

interface Props {
  preview: HorizonPreview;
  planHorizonHours: number;
  currency: string;
  /** Where "Make a plan with N h" leads; null for roles that cannot make plans. */
  makePlanUrl: string | null;
}

function costChange(preview: HorizonPreview, planHorizonHours: number, currency: string): string {
  const diff = preview.costDifference;
  const plan = `the plan’s ${formatNumber(planHorizonHours, 2)} h`;
  if (diff === null) return 'The plan has no cost to compare with yet.';
  // Cent-level differences are rounding, not a different schedule's worth.
  if (Math.abs(diff) < 0.005) return `The same as with ${plan}.`;
  return `${formatMoney(Math.abs(diff), currency)} ${diff < 0 ? 'less' : 'more'} paid than with ${plan}.`;
}

export function PreviewFigures({ preview, planHorizonHours, currency, makePlanUrl }: Props) {
  const h = `${formatNumber(preview.horizonHours, 2)} h`;
  const dh = preview.decisionHorizonHours;
  const rows: [string, string][] = [
    [
      'Cost over the delivery window',
      `${formatMoney(preview.cost, currency)}. ${costChange(preview, planHorizonHours, currency)}`,
    ],
    [
      'Decision horizon',
      dh === null
        ? 'not available'
        : `delivery decisions depend on prices at most ${formatNumber(dh, 2)} h ahead${preview.decisionHorizonLimitedByData ? ', the whole lookahead: a longer horizon might still change them' : ''}`,
    ],
    [
      'Near the steady cycle',
      `${formatPercent(preview.turnpike.nearSteadyShare)} of the steps; end SoC ${formatNumber(preview.endSocPct, 1)} %`,
    ],
    [
      'Computed in',
      `${formatNumber(preview.computeMs, 1)} ms on the exact fast path (${formatNumber(preview.serverMs, 1)} ms on the server in all)`,
    ],
  ];
  return (
    <div className="space-y-3">
      <FactList rows={rows} label={`Preview with ${h}`} />
      {preview.turnpike.flags.length > 0 && (
        <ul aria-label="Findings with this horizon" className="list-disc space-y-1 pl-5 text-sm text-ink-800">
          {preview.turnpike.flags.map((flag) => (
            <li key={flag}>{flag}</li>
          ))}
        </ul>
      )}
      {makePlanUrl && (
        <Link
          to={makePlanUrl}
          className="inline-block rounded bg-seaglass-700 px-4 py-2 text-sm font-semibold text-white hover:bg-seaglass-800"
        >
          Make a plan with {h}
        </Link>
      )}
    </div>
  );
}
