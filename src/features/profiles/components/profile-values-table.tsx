/** The numbers behind the chart, paged (TanStack Table v9: useTable, tableFeatures, table.FlexRender). */
import { useMemo } from 'react';
import {
  createColumnHelper,
  createPaginatedRowModel,
  rowPaginationFeature,
  tableFeatures,
  useTable,
} from '@tanstack/react-table';
import { buttonClass, compactSelect } from '@/components/form-field';
import { ScrollRegion } from '@/components/scroll-region';
import { numClass, tableClass, theadClass } from '@/components/table-classes';
import { formatCount, formatFixed, formatLocalTime } from '@/lib/format';

interface ValueRow {
  index: number;
  startMs: number;
  value: number;
  filled: boolean;
}

const features = tableFeatures({ rowPaginationFeature, paginatedRowModel: createPaginatedRowModel() });
const helper = createColumnHelper<typeof features, ValueRow>();
const PAGE_SIZES = [24, 96, 288, 1000];

export interface ProfileValuesTableProps {
  startMs: number;
  stepMinutes: number;
  values: readonly number[];
  filledIndexes: readonly number[];
  timeZone: string;
  unit: string;
  /** Decimals every value is shown with. */
  decimals: number;
}

/** Figures right-aligned to one number of decimals, e.g. 2 for prices and 3 for kW. */
const NUMERIC_COLUMNS = new Set(['index', 'value']);

export function ProfileValuesTable({
  startMs,
  stepMinutes,
  values,
  filledIndexes,
  timeZone,
  unit,
  decimals,
}: ProfileValuesTableProps) {
  const data = useMemo(() => {
    const filled = new Set(filledIndexes);
    return values.map((value, index) => ({
      index,
      startMs: startMs + index * stepMinutes * 60_000,
      value,
      filled: filled.has(index),
    }));
  }, [startMs, stepMinutes, values, filledIndexes]);
  const columns = useMemo(
    () =>
      helper.columns([
        helper.accessor('index', { header: '#', cell: (info) => formatCount(info.getValue() + 1) }),
        helper.accessor('startMs', {
          header: `Interval start (${timeZone})`,
          cell: (info) => formatLocalTime(info.getValue(), timeZone),
        }),
        helper.accessor('value', { header: unit, cell: (info) => formatFixed(info.getValue(), decimals) }),
        helper.accessor('filled', { header: 'Filled', cell: (info) => (info.getValue() ? 'interpolated' : '') }),
      ]),
    [timeZone, unit, decimals],
  );
  const table = useTable({ features, columns, data, initialState: { pagination: { pageIndex: 0, pageSize: 24 } } });
  const { pageIndex, pageSize } = table.state.pagination;

  return (
    <div className="space-y-2">
      <ScrollRegion label="Values table (scrolls sideways)">
        <table className={tableClass}>
          <caption className="sr-only">
            Values, page {pageIndex + 1} of {table.getPageCount()}
          </caption>
          <thead className={theadClass}>
            {table.getHeaderGroups().map((group) => (
              <tr key={group.id}>
                {group.headers.map((header) => (
                  <th
                    key={header.id}
                    scope="col"
                    className={`px-3 py-1.5 ${NUMERIC_COLUMNS.has(header.column.id) ? numClass : ''}`}
                  >
                    {header.isPlaceholder ? null : <table.FlexRender header={header} />}
                  </th>
                ))}
              </tr>
            ))}
          </thead>
          <tbody>
            {table.getRowModel().rows.map((row) => (
              <tr key={row.id} className={`border-t border-ink-100 tabular-nums ${row.original.filled ? 'bg-amber-100' : ''}`}>
                {row.getAllCells().map((cell) => (
                  <td
                    key={cell.id}
                    className={`px-3 py-1 ${NUMERIC_COLUMNS.has(cell.column.id) ? numClass : 'whitespace-nowrap'}`}
                  >
                    <table.FlexRender cell={cell} />
                  </td>
                ))}
              </tr>
            ))}
          </tbody>
        </table>
      </ScrollRegion>
      <nav aria-label="Pages of values" className="flex flex-wrap items-center gap-2 text-sm">
        <button
          type="button"
          className={buttonClass.secondary}
          onClick={() => table.firstPage()}
          disabled={!table.getCanPreviousPage()}
        >
          First
        </button>
        <button
          type="button"
          className={buttonClass.secondary}
          onClick={() => table.previousPage()}
          disabled={!table.getCanPreviousPage()}
        >
          Previous
        </button>
        <span>
          Page {pageIndex + 1} of {formatCount(table.getPageCount())}
        </span>
        <button
          type="button"
          className={buttonClass.secondary}
          onClick={() => table.nextPage()}
          disabled={!table.getCanNextPage()}
        >
          Next
        </button>
        <button
          type="button"
          className={buttonClass.secondary}
          onClick={() => table.lastPage()}
          disabled={!table.getCanNextPage()}
        >
          Last
        </button>
        <label className="ml-4 flex items-center gap-2">
          Rows per page
          <select className={compactSelect} value={pageSize} onChange={(e) => table.setPageSize(Number(e.target.value))}>
            {PAGE_SIZES.map((size) => (
              <option key={size} value={size}>
                {size}
              </option>
            ))}
          </select>
        </label>
      </nav>
    </div>
  );
}
