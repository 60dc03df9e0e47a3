import { useState } from 'react';
import {
  columnFilteringFeature,
  createColumnHelper,
  createFilteredRowModel,
  createSortedRowModel,
  filterFn_equalsString,
  filterFn_includesString,
  globalFilteringFeature,
  rowSortingFeature,
  sortFn_alphanumeric,
  sortFn_datetime,
  tableFeatures,
  useTable,
} from '@tanstack/react-table';
import { roleLabels, roles } from '@shared/schemas/auth';
import { userStatuses, type User } from '@shared/schemas/users';
import { DataTable } from '@/components/data-table';
import { inputClass } from '@/components/form-field';
import { RoleSelect, UserActions, isActiveAdmin, type ReportOutcome } from './user-row-actions';
import { formatMoment } from '@/lib/format';

const features = tableFeatures({
  columnFilteringFeature,
  globalFilteringFeature,
  rowSortingFeature,
  filteredRowModel: createFilteredRowModel(),
  sortedRowModel: createSortedRowModel(),
  filterFns: { includesString: filterFn_includesString, equalsString: filterFn_equalsString },
  sortFns: { alphanumeric: sortFn_alphanumeric, datetime: sortFn_datetime },
});

const helper = createColumnHelper<typeof features, User>();

const statusStyle: Record<User['status'], string> = {
  active: 'bg-seaglass-100 text-seaglass-700',
  invited: 'bg-amber-100 text-amber-700',
  disabled: 'bg-ink-100 text-ink-500',
};

const formatTime = (iso: string | null) => (iso ? formatMoment(iso) : 'never');

const isLastAdmin = (user: User, all: readonly User[]) => isActiveAdmin(user) && all.filter(isActiveAdmin).length === 1;

/** Columns need the live-region reporter, so they are built once per table instance. */
function buildColumns(report: ReportOutcome) {
  return helper.columns([
    helper.accessor('name', { header: 'Name', sortFn: 'alphanumeric' }),
    helper.accessor('email', { header: 'E-mail', sortFn: 'alphanumeric' }),
    helper.accessor('role', {
      header: 'Role',
      filterFn: 'equalsString',
      sortFn: 'alphanumeric',
      cell: (ctx) => (
        <RoleSelect user={ctx.row.original} report={report} lastAdmin={isLastAdmin(ctx.row.original, ctx.table.options.data)} />
      ),
    }),
    helper.accessor('status', {
      header: 'Status',
      filterFn: 'equalsString',
      cell: (ctx) => (
        <span className={`rounded-full px-2 py-0.5 text-xs font-semibold ${statusStyle[ctx.getValue()]}`}>{ctx.getValue()}</span>
      ),
    }),
    helper.accessor('lastSignInAt', {
      header: 'Last sign-in',
      sortFn: 'datetime',
      sortUndefined: 'last',
      cell: (ctx) => formatTime(ctx.getValue()),
    }),
    helper.display({
      id: 'actions',
      header: 'Actions',
      cell: (ctx) => (
        <UserActions user={ctx.row.original} report={report} lastAdmin={isLastAdmin(ctx.row.original, ctx.table.options.data)} />
      ),
    }),
  ]);
}

function FilterSelect(props: {
  label: string;
  value: string;
  onValue: (v: string) => void;
  options: readonly (readonly [string, string])[];
}) {
  return (
    <label className="flex flex-col gap-1 text-sm font-medium text-ink-800">
      {props.label}
      <select value={props.value} onChange={(e) => props.onValue(e.target.value)} className={inputClass}>
        {props.options.map(([value, text]) => (
          <option key={value} value={value}>
            {text}
          </option>
        ))}
      </select>
    </label>
  );
}

export function UsersTable({ users, report }: { users: User[]; report: ReportOutcome }) {
  const [columns] = useState(() => buildColumns(report));
  const table = useTable({
    features,
    columns,
    data: users,
    globalFilterFn: 'includesString',
    getColumnCanGlobalFilter: (column) => column.id === 'name' || column.id === 'email',
    initialState: { sorting: [{ id: 'email', desc: false }] },
  });
  const roleColumn = table.getColumn('role');
  const statusColumn = table.getColumn('status');
  const rows = table.getRowModel().rows;

  return (
    <div className="space-y-3">
      <div className="flex flex-wrap items-end gap-4">
        <label className="flex flex-col gap-1 text-sm font-medium text-ink-800">
          Search name or e-mail
          <input
            type="search"
            value={String(table.state.globalFilter ?? '')}
            onChange={(e) => table.setGlobalFilter(e.target.value)}
            className={`${inputClass} w-64`}
          />
        </label>
        <FilterSelect
          label="Role"
          value={(roleColumn?.getFilterValue() as string | undefined) ?? ''}
          onValue={(v) => roleColumn?.setFilterValue(v || undefined)}
          options={[['', 'All roles'], ...roles.map((r) => [r, roleLabels[r]] as const)]}
        />
        <FilterSelect
          label="Status"
          value={(statusColumn?.getFilterValue() as string | undefined) ?? ''}
          onValue={(v) => statusColumn?.setFilterValue(v || undefined)}
          options={[['', 'All'], ...userStatuses.map((st) => [st, st] as const)]}
        />
        <p className="ml-auto text-sm text-ink-500" aria-live="polite">
          {rows.length} of {users.length} users
        </p>
      </div>
      <div className="overflow-x-auto rounded-lg border border-ink-100 bg-white shadow-sm">
        <DataTable
          table={table}
          className="w-full text-left text-sm"
          headClassName="bg-ink-50 text-ink-700"
          headerCellClassName="px-4 py-2 font-semibold"
          cellClassName="px-4 py-2 align-middle"
          ariaSort={(header) => {
            const sorted = header.column.getIsSorted();
            return sorted ? (sorted === 'asc' ? 'ascending' : 'descending') : undefined;
          }}
          renderHeader={(header) => {
            const sorted = header.column.getIsSorted();
            return header.column.getCanSort() ? (
              <button
                type="button"
                onClick={header.column.getToggleSortingHandler()}
                className="inline-flex items-center gap-1 hover:text-ink-900"
              >
                <table.FlexRender header={header} />
                <span aria-hidden="true" className="text-xs text-ink-500">
                  {sorted === 'asc' ? '▲' : sorted === 'desc' ? '▼' : '↕'}
                </span>
              </button>
            ) : (
              <table.FlexRender header={header} />
            );
          }}
          empty={
            <tr>
              <td colSpan={6} className="px-4 py-6 text-center text-ink-500">
                No user matches these filters.
              </td>
            </tr>
          }
        />
      </div>
    </div>
  );
}
