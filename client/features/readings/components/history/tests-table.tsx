import {
  createColumnHelper,
  flexRender,
  getCoreRowModel,
  getFilteredRowModel,
  getPaginationRowModel,
  getSortedRowModel,
  useReactTable,
  type ColumnFiltersState,
  type FilterFn,
  type SortingState,
} from '@tanstack/react-table';
import { useMemo, useState } from 'react';
import { Link } from 'react-router';
import { PARAMETER_KEYS, parameterInfo, type ParameterKey } from '@shared/care/parameters';
import { TEST_METHOD_LABELS } from '@shared/constants/tank-labels';
import { TEST_METHODS, type TestMethod } from '@shared/readings/entry-units';
import type { WaterTestView } from '@shared/schemas/tank-views';
import { Button } from '@client/components/ui/button';
import { Select } from '@client/components/ui/select';
import { formatDayTime } from '@client/lib/date-format';
import { displayUnit, formatDisplayNumber, type UnitPrefs } from '@client/lib/display-units';

const col = createColumnHelper<WaterTestView>();
const methodsOf = (t: WaterTestView): TestMethod[] => [
  ...new Set(Object.values(t.entries).flatMap((e) => (e?.method ? [e.method] : []))),
];
const hasValue: FilterFn<WaterTestView> = (row, id) => row.getValue(id) !== undefined;

/** Past tests: sortable by date or any parameter, filterable by parameter and method, in the member's units. */
export function TestsTable({
  tests,
  prefs,
  editable,
  tankId,
}: {
  tests: WaterTestView[];
  prefs: UnitPrefs;
  editable: boolean;
  tankId: string;
}) {
  const present = useMemo(
    () => PARAMETER_KEYS.filter((k) => tests.some((t) => t.values[k] !== undefined)),
    [tests],
  );
  const [sorting, setSorting] = useState<SortingState>([{ id: 'takenAt', desc: true }]);
  const [filters, setFilters] = useState<ColumnFiltersState>([]);
  const columns = useMemo(
    () => [
      col.accessor((t) => Date.parse(t.takenAt), {
        id: 'takenAt',
        header: 'Date',
        cell: (c) => formatDayTime(c.getValue()),
        sortDescFirst: true,
      }),
      ...present.map((k) =>
        col.accessor((t) => t.values[k], {
          id: k,
          header: () => (
            <>
              {parameterInfo(k).label}
              {displayUnit(k, prefs) ? (
                <span className="block text-xs font-semibold text-ink-muted">{displayUnit(k, prefs)}</span>
              ) : null}
            </>
          ),
          cell: (c) => {
            const v = c.getValue();
            return v === undefined ? (
              <span className="text-ink-muted">–</span>
            ) : (
              formatDisplayNumber(k, v, prefs)
            );
          },
          sortUndefined: 'last',
          filterFn: hasValue,
          meta: { numeric: true },
        }),
      ),
      col.accessor(methodsOf, {
        id: 'method',
        header: 'Method',
        enableSorting: false,
        filterFn: 'arrIncludes',
        cell: (c) =>
          c
            .getValue()
            .map((m) => TEST_METHOD_LABELS[m])
            .join(', '),
      }),
      col.accessor('note', {
        header: 'Note',
        enableSorting: false,
        cell: (c) => <span className="line-clamp-2 max-w-56">{c.getValue()}</span>,
      }),
      ...(editable
        ? [
            col.display({
              id: 'edit',
              header: () => <span className="sr-only">Edit</span>,
              cell: (c) => (
                <Link
                  className="font-bold text-link underline"
                  to={`/tanks/${tankId}/tests/${c.row.original.id}/edit`}
                >
                  Edit
                </Link>
              ),
            }),
          ]
        : []),
    ],
    [present, prefs, editable, tankId],
  );
  // TanStack Table keeps its own state in a mutable instance; the React Compiler rightly skips memoizing this component.
  // eslint-disable-next-line react-hooks/incompatible-library
  const table = useReactTable({
    data: tests,
    columns,
    state: { sorting, columnFilters: filters },
    onSortingChange: setSorting,
    onColumnFiltersChange: setFilters,
    getCoreRowModel: getCoreRowModel(),
    getSortedRowModel: getSortedRowModel(),
    getFilteredRowModel: getFilteredRowModel(),
    getPaginationRowModel: getPaginationRowModel(),
    initialState: { pagination: { pageSize: 15 } },
  });
  const parameterFilter = filters.find((f) => f.id !== 'method')?.id ?? '';
  const methodFilter = (filters.find((f) => f.id === 'method')?.value as string | undefined) ?? '';
  const setFilter = (parameter: string, method: string) =>
    setFilters([
      ...(parameter ? [{ id: parameter, value: true }] : []),
      ...(method ? [{ id: 'method', value: method }] : []),
    ]);
  const rows = table.getRowModel().rows;
  const { pageIndex } = table.getState().pagination;

  return (
    <div>
      <div className="flex flex-wrap gap-3">
        <label className="flex flex-col text-sm font-bold text-ink-soft">
          Tests with
          <Select
            className=""
            value={parameterFilter}
            onChange={(e) => setFilter(e.target.value, methodFilter)}
          >
            <option value="">Any reading</option>
            {present.map((k: ParameterKey) => (
              <option key={k} value={k}>
                {parameterInfo(k).label}
              </option>
            ))}
          </Select>
        </label>
        <label className="flex flex-col text-sm font-bold text-ink-soft">
          Measured with
          <Select
            className=""
            value={methodFilter}
            onChange={(e) => setFilter(parameterFilter, e.target.value)}
          >
            <option value="">Any method</option>
            {TEST_METHODS.map((m) => (
              <option key={m} value={m}>
                {TEST_METHOD_LABELS[m]}
              </option>
            ))}
          </Select>
        </label>
        <p className="self-end pb-2 text-sm text-ink-muted">
          {table.getFilteredRowModel().rows.length} of {tests.length} tests
        </p>
      </div>
      <div className="relative mt-3 overflow-x-auto rounded-xl ring-1 ring-line">
        <table className="min-w-full text-sm">
          <thead className="bg-tint text-left text-ink-soft">
            {table.getHeaderGroups().map((g) => (
              <tr key={g.id}>
                {g.headers.map((h) => {
                  const sorted = h.column.getIsSorted();
                  const numeric = (h.column.columnDef.meta as { numeric?: boolean } | undefined)?.numeric;
                  return (
                    <th
                      key={h.id}
                      scope="col"
                      aria-sort={
                        sorted === 'asc' ? 'ascending' : sorted === 'desc' ? 'descending' : undefined
                      }
                      className={`px-3 py-2 align-bottom font-bold whitespace-nowrap ${h.column.id === 'takenAt' ? 'sticky left-0 bg-tint' : ''} ${numeric ? 'text-right' : ''}`}
                    >
                      {h.column.getCanSort() ? (
                        <button
                          type="button"
                          className="inline-flex min-h-touch items-end gap-1 text-left"
                          onClick={h.column.getToggleSortingHandler()}
                        >
                          <span>{flexRender(h.column.columnDef.header, h.getContext())}</span>
                          <span aria-hidden className="text-ink-muted">
                            {sorted === 'asc' ? '▲' : sorted === 'desc' ? '▼' : '↕'}
                          </span>
                        </button>
                      ) : (
                        flexRender(h.column.columnDef.header, h.getContext())
                      )}
                    </th>
                  );
                })}
              </tr>
            ))}
          </thead>
          <tbody className="divide-y divide-line bg-surface">
            {rows.map((r) => (
              <tr key={r.id}>
                {r.getVisibleCells().map((c) => (
                  <td
                    key={c.id}
                    className={`px-3 py-2 ${c.column.id === 'note' ? 'min-w-56' : 'whitespace-nowrap'} ${c.column.id === 'takenAt' ? 'sticky left-0 bg-surface font-semibold' : ''} ${(c.column.columnDef.meta as { numeric?: boolean } | undefined)?.numeric ? 'text-right tabular-nums' : ''}`}
                  >
                    {flexRender(c.column.columnDef.cell, c.getContext())}
                  </td>
                ))}
              </tr>
            ))}
            {rows.length === 0 ? (
              <tr>
                <td colSpan={columns.length} className="px-3 py-6 text-center text-ink-muted">
                  No tests match.
                </td>
              </tr>
            ) : null}
          </tbody>
        </table>
      </div>
      {table.getPageCount() > 1 ? (
        <div className="mt-3 flex items-center justify-between gap-2">
          <Button
            variant="secondary"
            disabled={!table.getCanPreviousPage()}
            onClick={() => table.previousPage()}
            aria-label="Previous page"
          >
            Previous
          </Button>
          <p className="text-sm whitespace-nowrap text-ink-muted">
            Page {pageIndex + 1} of {table.getPageCount()}
          </p>
          <Button
            variant="secondary"
            disabled={!table.getCanNextPage()}
            onClick={() => table.nextPage()}
            aria-label="Next page"
          >
            Next
          </Button>
        </div>
      ) : null}
    </div>
  );
}
