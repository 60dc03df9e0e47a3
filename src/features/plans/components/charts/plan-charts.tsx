/**
 * Every chart of a plan page. Default export so the page loads it with
 * React.lazy: the chart libraries stay out of the first bundle.
 */
import { useMemo } from 'react';
import type { PlanResults } from '@shared/schemas/plan';
import { splitSteps } from './chart-data';
import { PriceDispatchChart } from './price-dispatch-chart';
import { SocChart } from './soc-chart';
import { DistanceChart } from './distance-chart';
import { ValueChart } from './value-chart';
import { ValueCurvesChart } from './value-curves-chart';
import { SitePowerChart } from './site-power-chart';

export interface PlanChartsProps {
  results: PlanResults;
  timeZone: string;
  currency: string;
  energyKwh: number;
  usableKwh: number;
  /** The site's load and generation per step (null: the plan has no such profile), and its grid limits. */
  load: (number | null)[] | null;
  generation: (number | null)[] | null;
  importLimitKw: number | null;
  exportLimitKw: number | null;
}

export default function PlanCharts({
  results,
  timeZone,
  currency,
  energyKwh,
  usableKwh,
  load,
  generation,
  importLimitKw,
  exportLimitKw,
}: PlanChartsProps) {
  const split = useMemo(() => splitSteps(results), [results]);
  const bandSocPct = ((results.turnpike.bandPct / 100) * usableKwh * 100) / energyKwh;
  return (
    <div className="space-y-4">
      <PriceDispatchChart split={split} timeZone={timeZone} currency={currency} />
      <SitePowerChart
        split={split}
        timeZone={timeZone}
        load={load}
        generation={generation}
        importLimitKw={importLimitKw}
        exportLimitKw={exportLimitKw}
      />
      <SocChart
        split={split}
        timeZone={timeZone}
        energyKwh={energyKwh}
        bandSocPct={bandSocPct}
        bandPct={results.turnpike.bandPct}
      />
      <div className="grid gap-4 lg:grid-cols-2">
        <DistanceChart split={split} timeZone={timeZone} bandPct={results.turnpike.bandPct} />
        <ValueChart split={split} timeZone={timeZone} currency={currency} />
      </div>
      {results.valueCurves.length > 0 && (
        <ValueCurvesChart curves={results.valueCurves} timeZone={timeZone} currency={currency} />
      )}
    </div>
  );
}
