/**
 * The app's table markup in one place: a TanStack Table v9 instance rendered as
 * a captioned table (`DataTable`), its page controls (`TablePager`), and the
 * header row of the plain tables (`TableHead`). Callers pass only the classes
 * that differ, so every table keeps its own look.
 */
import type { ReactNode } from 'react';
import type { Header, ReactTable, RowData, TableFeatures } from '@tanstack/react-table';
import { buttonClass, compactSelect } from './form-field';

const headClass = 'bg-ink-100 text-ink-700';

export interface DataTableProps<TFeatures extends TableFeatures, TData extends RowData> {
  // The table's selected state is not read here; any selection will do.
  // eslint-disable-next-line @typescript-eslint/no-explicit-any -- see above
  table: ReactTable<TFeatures, TData, any>;
  /** Screen-reader caption (shown only to assistive technology). */
  caption?: ReactNode;
  className?: string;
  headClassName?: string;
  headerCellClassName: string;
  cellClassName: string;
  /** The whole class of a body row. */
  rowClassName?: (row: TData) => string;
  /** Header content other than the column's own header (e.g. a sort button). */
  renderHeader?: (header: Header<TFeatures, TData>) => ReactNode;
  /** The header cell's aria-sort, for sortable columns. */
  ariaSort?: (header: Header<TFeatures, TData>) => 'ascending' | 'descending' | undefined;
  /** A row shown when there are no rows. */
  empty?: ReactNode;
}

export function DataTable<TFeatures extends TableFeatures, TData extends RowData>({
  table,
  caption,
  className = 'w-full rounded bg-white text-left text-sm shadow-sm',
  headClassName = headClass,
  headerCellClassName,
  cellClassName,
  rowClassName = () => 'border-t border-ink-100',
  renderHeader,
  ariaSort,
  empty,
}: DataTableProps<TFeatures, TData>) {
  const rows = table.getRowModel().rows;
  return (
    <table className={className}>
      {caption !== undefined && <caption className="sr-only">{caption}</caption>}
      <thead className={headClassName}>
        {table.getHeaderGroups().map((group) => (
          <tr key={group.id}>
            {group.headers.map((header) => (
              <th key={header.id} scope="col" aria-sort={ariaSort?.(header)} className={headerCellClassName}>
                {header.isPlaceholder ? null : renderHeader ? renderHeader(header) : <table.FlexRender header={header} />}
              </th>
            ))}
          </tr>
        ))}
      </thead>
      <tbody>
        {rows.map((row) => (
          <tr key={row.id} className={rowClassName(row.original)}>
            {row.getAllCells().map((cell) => (
              <td key={cell.id} className={cellClassName}>
                <table.FlexRender cell={cell} />
              </td>
            ))}
          </tr>
        ))}
        {rows.length === 0 && empty}
      </tbody>
    </table>
  );
}

/** What the page controls use of a table with the row-pagination feature. */
interface PagedTable {
  readonly state: { readonly pagination: { readonly pageIndex: number; readonly pageSize: number } };
  firstPage(): void;
  previousPage(): void;
  nextPage(): void;
  lastPage(): void;
  getCanPreviousPage(): boolean;
  getCanNextPage(): boolean;
  getPageCount(): number;
  setPageSize(size: number): void;
}

export interface TablePagerProps {
  table: PagedTable;
  /** The nav's accessible name, e.g. "Pages of values". */
  label: string;
  className?: string;
  /** Also offer First and Last. */
  ends?: boolean;
  /** Offer these page sizes ("Rows per page"). */
  pageSizes?: readonly number[];
}

/** Previous / Page n of N / Next (and optionally First, Last and a page size) for a paginated table. */
export function TablePager({
  table,
  label,
  className = 'flex items-center gap-2 text-sm',
  ends = false,
  pageSizes,
}: TablePagerProps) {
  const { pageIndex, pageSize } = table.state.pagination;
  const button = (text: string, onClick: () => void, disabled: boolean) => (
    <button type="button" className={buttonClass.secondary} onClick={onClick} disabled={disabled}>
      {text}
    </button>
  );
  return (
    <nav aria-label={label} className={className}>
      {ends && button('First', () => table.firstPage(), !table.getCanPreviousPage())}
      {button('Previous', () => table.previousPage(), !table.getCanPreviousPage())}
      <span>
        Page {pageIndex + 1} of {table.getPageCount().toLocaleString()}
      </span>
      {button('Next', () => table.nextPage(), !table.getCanNextPage())}
      {ends && button('Last', () => table.lastPage(), !table.getCanNextPage())}
      {pageSizes && (
        <label className="ml-4 flex items-center gap-2">
          Rows per page
          <select className={compactSelect} value={pageSize} onChange={(e) => table.setPageSize(Number(e.target.value))}>
            {pageSizes.map((size) => (
              <option key={size} value={size}>
                {size}
              </option>
            ))}
          </select>
        </label>
      )}
    </nav>
  );
}

/** The header row of a plain (non-TanStack) table. */
export function TableHead({
  headers,
  cellClassName = 'whitespace-nowrap px-2 py-1.5',
}: {
  headers: readonly ReactNode[];
  cellClassName?: string;
}) {
  return (
    <thead className={headClass}>
      <tr>
        {headers.map((h, k) => (
          <th key={typeof h === 'string' ? h : k} scope="col" className={cellClassName}>
            {h}
          </th>
        ))}
      </tr>
    </thead>
  );
}
