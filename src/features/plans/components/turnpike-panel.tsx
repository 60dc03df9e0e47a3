/**
 * The turnpike figures in plain words: how long the plan stays near the steady
 * cycle, its entry and leaving arcs, the commit window, and the flags a planner
 * can act on (docs/model.md).
 */
import type { PlanResults } from '@shared/schemas/plan';
import { formatPercent, formatSteps } from '@/lib/format';
import { FactList } from './fact-list';

export function TurnpikePanel({ results }: { results: PlanResults }) {
  const tp = results.turnpike;
  const step = results.stepMinutes;
  const rows: [string, string][] = [
    [
      'Near-steady share',
      `${formatPercent(tp.nearSteadyShare)} of the steps within ${tp.bandPct} % of usable energy (${tp.bandKwh.toFixed(0)} kWh) of the steady cycle`,
    ],
    [
      'Entry arc',
      tp.entryArcSteps > 0 ? `the first ${formatSteps(tp.entryArcSteps, step)}` : 'none: the plan starts on the steady cycle',
    ],
    ['Leaving arc', tp.leavingArcSteps > 0 ? `the last ${formatSteps(tp.leavingArcSteps, step)}` : 'none'],
    [
      'Commit window',
      tp.commitWindowSteps === null
        ? 'not checked (no longer lookahead available)'
        : `${formatSteps(tp.commitWindowSteps, step)} agree with a ${tp.longerLookaheadHours ?? '?'} h lookahead`,
    ],
    ['Stored-energy value', `near its steady value in ${formatPercent(tp.value.nearSteadyShare)} of the comparable steps`],
  ];
  if (results.decisionHorizonHours !== null)
    rows.push(['Decision horizon', `delivery decisions depend on prices at most ${results.decisionHorizonHours} h ahead`]);
  return (
    <section aria-labelledby="turnpike-heading" className="space-y-3 rounded-lg border border-ink-100 bg-white p-5 shadow-sm">
      <h2 id="turnpike-heading" className="text-lg font-semibold text-ink-900">
        How long the plan can be trusted
      </h2>
      <p className="text-ink-800">{tp.summary}</p>
      <FactList rows={rows} />
      {tp.flags.length > 0 && (
        <ul aria-label="Flags" className="space-y-2">
          {tp.flags.map((flag) => (
            <li key={flag} className="rounded border-l-4 border-amber-500 bg-amber-100 px-3 py-2 text-sm text-ink-900">
              {flag}
            </li>
          ))}
        </ul>
      )}
      {results.notes.length > 0 && (
        <ul className="list-disc pl-5 text-xs text-ink-500">
          {results.notes.map((n) => (
            <li key={n}>{n}</li>
          ))}
        </ul>
      )}
    </section>
  );
}
