/** The numbers behind the chart, paged (TanStack Table v9: useTable, tableFeatures, table.FlexRender). */
import { useMemo } from 'react';
import {
  createColumnHelper,
  createPaginatedRowModel,
  rowPaginationFeature,
  tableFeatures,
  useTable,
} from '@tanstack/react-table';
import { DataTable, TablePager } from '@/components/data-table';
import { formatLocalTime, formatNumber } from '@/lib/format';

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
}

export function ProfileValuesTable({ startMs, stepMinutes, values, filledIndexes, timeZone, unit }: ProfileValuesTableProps) {
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
        helper.accessor('index', { header: '#', cell: (info) => info.getValue() + 1 }),
        helper.accessor('startMs', {
          header: `Interval start (${timeZone})`,
          cell: (info) => formatLocalTime(info.getValue(), timeZone),
        }),
        helper.accessor('value', { header: unit, cell: (info) => formatNumber(info.getValue(), 4) }),
        helper.accessor('filled', { header: 'Filled', cell: (info) => (info.getValue() ? 'interpolated' : '') }),
      ]),
    [timeZone, unit],
  );
  const table = useTable({ features, columns, data, initialState: { pagination: { pageIndex: 0, pageSize: 24 } } });
  const { pageIndex } = table.state.pagination;

  return (
    <div className="space-y-2">
      <DataTable
        table={table}
        caption={`Values, page ${pageIndex + 1} of ${table.getPageCount()}`}
        headerCellClassName="px-3 py-1.5"
        cellClassName="px-3 py-1"
        rowClassName={(row) => `border-t border-ink-100 tabular-nums ${row.filled ? 'bg-amber-100' : ''}`}
      />
      <TablePager
        table={table}
        label="Pages of values"
        className="flex flex-wrap items-center gap-2 text-sm"
        ends
        pageSizes={PAGE_SIZES}
      />
    </div>
  );
}
