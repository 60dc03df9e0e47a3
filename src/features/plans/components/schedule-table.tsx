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
import { buttonClass } from '@/components/form-field';
import { formatFixed, formatLocalTime } from '@/lib/format';
import { ScrollRegion } from '@/components/scroll-region';
import { numClass, tableClass, theadClass } from '@/components/table-classes';

const features = tableFeatures({ rowPaginationFeature, paginatedRowModel: createPaginatedRowModel() });
const helper = createColumnHelper<typeof features, PlanStep>();

/** Columns of text; every other column holds figures, right-aligned to fixed decimals. */
const TEXT_COLUMNS = new Set(['time', 'delivery', 'arc']);
const alignOf = (id: string) => (TEXT_COLUMNS.has(id) ? 'whitespace-nowrap' : numClass);
// The start time stays in view while the table scrolls sideways, so every row stays identifiable.
const stickyFirst = (id: string) => (id === 'time' ? 'sticky left-0 z-10 bg-inherit' : '');

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
        helper.accessor('priceImport', { header: `Price ${currency}/MWh`, cell: (i) => formatFixed(i.getValue(), 2) }),
        helper.accessor('chargeKw', { header: 'Charge kW', cell: (i) => formatFixed(i.getValue(), 1) }),
        helper.accessor('dischargeKw', { header: 'Discharge kW', cell: (i) => formatFixed(i.getValue(), 1) }),
        helper.accessor('socKwh', { header: 'SoC kWh (end)', cell: (i) => formatFixed(i.getValue(), 1) }),
        helper.accessor('socPct', { header: 'SoC %', cell: (i) => formatFixed(i.getValue(), 1) }),
        helper.accessor('steadySocKwh', {
          header: 'Steady SoC %',
          cell: (i) => formatFixed(i.getValue() === null ? null : (i.getValue()! / energyKwh) * 100, 1),
        }),
        helper.accessor('gridImportKw', { header: 'Import kW', cell: (i) => formatFixed(i.getValue(), 1) }),
        helper.accessor('gridExportKw', { header: 'Export kW', cell: (i) => formatFixed(i.getValue(), 1) }),
        helper.accessor('storedEnergyValue', {
          header: `Stored-energy value ${currency}/MWh`,
          cell: (i) => formatFixed(i.getValue(), 2),
        }),
        helper.accessor('distance', {
          header: 'Distance % usable',
          cell: (i) => formatFixed(i.getValue() === null ? null : i.getValue()! * 100, 1),
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
        <table className={tableClass}>
          <caption className="sr-only">
            Schedule, one row per step; page {pageIndex + 1} of {table.getPageCount()}
          </caption>
          <thead className={theadClass}>
            {table.getHeaderGroups().map((group) => (
              <tr key={group.id}>
                {group.headers.map((header) => (
                  <th
                    key={header.id}
                    scope="col"
                    className={`bg-ink-100 px-2 py-1.5 align-bottom ${TEXT_COLUMNS.has(header.column.id) ? 'whitespace-nowrap' : 'text-right'} ${stickyFirst(header.column.id)}`}
                  >
                    {header.isPlaceholder ? null : <table.FlexRender header={header} />}
                  </th>
                ))}
              </tr>
            ))}
          </thead>
          <tbody>
            {table.getRowModel().rows.map((row) => (
              <tr
                key={row.id}
                className={`border-t border-ink-100 tabular-nums ${row.original.delivery ? '' : 'italic text-ink-500'} ${row.original.arc === 'leaving' ? 'bg-amber-100' : 'bg-white'}`}
              >
                {row.getAllCells().map((cell) => (
                  <td key={cell.id} className={`px-2 py-1 ${alignOf(cell.column.id)} ${stickyFirst(cell.column.id)}`}>
                    <table.FlexRender cell={cell} />
                  </td>
                ))}
              </tr>
            ))}
          </tbody>
        </table>
      </ScrollRegion>
      <nav aria-label="Pages of the schedule" className="flex items-center gap-2 text-sm">
        <button
          type="button"
          className={buttonClass.secondary}
          onClick={() => table.previousPage()}
          disabled={!table.getCanPreviousPage()}
        >
          Previous
        </button>
        <span>
          Page {pageIndex + 1} of {table.getPageCount()}
        </span>
        <button
          type="button"
          className={buttonClass.secondary}
          onClick={() => table.nextPage()}
          disabled={!table.getCanNextPage()}
        >
          Next
        </button>
      </nav>
    </div>
  );
}
