/**
 * The schedule as a table: the text alternative of the charts, one row per
 * step, delivery window first, lookahead rows faded (TanStack Table v9).
 */
import { useMemo } from 'react';
import {
  createColumnHelper,
  createPaginatedRowModel,
  rowPaginationFeature,
  tableFeatures,
  useTable,
} from '@tanstack/react-table';
import type { PlanResults, PlanStep } from '@shared/schemas/plan';
import { formatLocalTime, formatNumber } from '@/lib/format';
import { ScrollRegion } from '@/components/scroll-region';
import { DataTable, TablePager } from '@/components/data-table';

const features = tableFeatures({ rowPaginationFeature, paginatedRowModel: createPaginatedRowModel() });
const helper = createColumnHelper<typeof features, PlanStep>();

const arcWords: Record<PlanStep['arc'], string> = {
  entry: 'entry arc',
  near: 'near steady',
  leaving: 'leaving arc',
  outside: 'off the band',
};

export function ScheduleTable({
  results,
  timeZone,
  currency,
  energyKwh,
}: {
  results: PlanResults;
  timeZone: string;
  currency: string;
  energyKwh: number;
}) {
  const columns = useMemo(
    () =>
      helper.columns([
        helper.accessor('time', {
          header: `Start (${timeZone})`,
          cell: (i) => formatLocalTime(Date.parse(i.getValue()), timeZone),
        }),
        helper.accessor('delivery', { header: 'Part', cell: (i) => (i.getValue() ? 'delivery' : 'lookahead') }),
        helper.accessor('priceImport', { header: `Price ${currency}/MWh`, cell: (i) => formatNumber(i.getValue(), 2) }),
        helper.accessor('chargeKw', { header: 'Charge kW', cell: (i) => formatNumber(i.getValue(), 1) }),
        helper.accessor('dischargeKw', { header: 'Discharge kW', cell: (i) => formatNumber(i.getValue(), 1) }),
        helper.accessor('socKwh', { header: 'SoC kWh (end)', cell: (i) => formatNumber(i.getValue(), 1) }),
        helper.accessor('socPct', { header: 'SoC %', cell: (i) => formatNumber(i.getValue(), 1) }),
        helper.accessor('steadySocKwh', {
          header: 'Steady SoC %',
          cell: (i) => formatNumber(i.getValue() === null ? null : (i.getValue()! / energyKwh) * 100, 1),
        }),
        helper.accessor('gridImportKw', { header: 'Import kW', cell: (i) => formatNumber(i.getValue(), 1) }),
        helper.accessor('gridExportKw', { header: 'Export kW', cell: (i) => formatNumber(i.getValue(), 1) }),
        helper.accessor('storedEnergyValue', {
          header: `Stored-energy value ${currency}/MWh`,
          cell: (i) => formatNumber(i.getValue(), 2),
        }),
        helper.accessor('distance', {
          header: 'Distance % usable',
          cell: (i) => formatNumber(i.getValue() === null ? null : i.getValue()! * 100, 1),
        }),
        helper.accessor('arc', { header: 'Arc', cell: (i) => arcWords[i.getValue()] }),
      ]),
    [timeZone, currency, energyKwh],
  );
  const table = useTable({
    features,
    columns,
    data: results.steps,
    initialState: { pagination: { pageIndex: 0, pageSize: Math.min(96, Math.max(24, results.deliverySteps)) } },
  });
  const { pageIndex } = table.state.pagination;
  return (
    <div className="space-y-2">
      <ScrollRegion label="Schedule table (scrolls sideways)">
        <DataTable
          table={table}
          caption={`Schedule, one row per step; page ${pageIndex + 1} of ${table.getPageCount()}`}
          headerCellClassName="whitespace-nowrap px-2 py-1.5"
          cellClassName="whitespace-nowrap px-2 py-1"
          rowClassName={(step) =>
            `border-t border-ink-100 tabular-nums ${step.delivery ? '' : 'italic text-ink-500'} ${step.arc === 'leaving' ? 'bg-amber-100' : ''}`
          }
        />
      </ScrollRegion>
      <TablePager table={table} label="Pages of the schedule" />
    </div>
  );
}
