import {
  rowPaginationFeature,
  rowSortingFeature,
  tableFeatures,
  useTable,
  type ColumnDef,
  type RowData,
  type SortingState,
} from '@tanstack/react-table';
import type { ReactNode } from 'react';
import { Button } from './button';
import { Notice } from './notice';
import { ScrollX } from './scroll-x';

/** The features every server-driven table uses: sorting and paging, both done by the API. */
export const dataTableFeatures = tableFeatures({ rowSortingFeature, rowPaginationFeature });
export type DataTableColumn<T extends RowData> = ColumnDef<typeof dataTableFeatures, T>;

/** Where a server-driven list is: which column sorts which way, and which page of what size. */
export interface ListView {
  sort: string;
  order: 'asc' | 'desc';
  page: number;
  pageSize: number;
}

interface Props<T extends RowData> {
  caption: string;
  columns: DataTableColumn<T>[];
  /** The list query as TanStack Query answers it: a page of rows with the total, while loading, or its error. */
  list: { data?: { items: T[]; total: number }; isPending: boolean; error: Error | null };
  view: ListView;
  onView: (view: ListView) => void;
  empty: ReactNode;
  rowKey: (row: T) => string;
}

const EMPTY: never[] = [];

/**
 * A table whose sorting and paging happen on the server: header clicks and the pager only change `view`,
 * which the caller puts in its query key. Shows loading, error and empty states in words.
 */
export function DataTable<T extends RowData>({ caption, columns, list, view, onView, empty, rowKey }: Props<T>) {
  const { data, isPending: isLoading, error } = list;
  const rows = data?.items;
  const total = data?.total ?? 0;
  const sorting: SortingState = [{ id: view.sort, desc: view.order === 'desc' }];
  const pagination = { pageIndex: view.page - 1, pageSize: view.pageSize };
  const table = useTable({
    features: dataTableFeatures,
    columns,
    data: rows ?? (EMPTY as T[]),
    getRowId: rowKey,
    rowCount: total,
    manualSorting: true,
    manualPagination: true,
    state: { sorting, pagination },
    onSortingChange: (updater) => {
      const next = typeof updater === 'function' ? updater(sorting) : updater;
      const first = next[0] ?? { id: view.sort, desc: view.order !== 'desc' };
      onView({ ...view, sort: first.id, order: first.desc ? 'desc' : 'asc', page: 1 });
    },
    onPaginationChange: (updater) => {
      const next = typeof updater === 'function' ? updater(pagination) : updater;
      onView({ ...view, page: next.pageIndex + 1, pageSize: next.pageSize });
    },
  });
  if (error) return <Notice tone="error">{error.message}</Notice>;
  const pages = Math.max(1, Math.ceil(total / view.pageSize));
  return (
    <div className="space-y-3">
      <ScrollX label={caption}>
        <table className="w-full text-left" aria-busy={isLoading}>
          <caption className="sr-only">{caption}</caption>
          <thead className="border-b border-ink-faint text-sm text-ink-soft">
            {table.getHeaderGroups().map((group) => (
              <tr key={group.id}>
                {group.headers.map((header) => {
                  const sorted = header.column.getIsSorted();
                  const canSort = header.column.getCanSort();
                  const label = header.isPlaceholder ? null : <table.FlexRender header={header} />;
                  return (
                    <th
                      key={header.id}
                      scope="col"
                      className="py-2 pr-3"
                      aria-sort={sorted ? (sorted === 'asc' ? 'ascending' : 'descending') : undefined}
                    >
                      {canSort ? (
                        <button
                          type="button"
                          className="font-medium hover:text-ink"
                          onClick={header.column.getToggleSortingHandler()}
                        >
                          {label} {sorted === 'asc' ? '▲' : sorted === 'desc' ? '▼' : ''}
                        </button>
                      ) : (
                        label
                      )}
                    </th>
                  );
                })}
              </tr>
            ))}
          </thead>
          <tbody>
            {table.getRowModel().rows.map((row) => (
              <tr key={row.id} className="border-b border-paper-deep align-top">
                {row.getAllCells().map((cell) => (
                  <td key={cell.id} className="py-2 pr-3">
                    <table.FlexRender cell={cell} />
                  </td>
                ))}
              </tr>
            ))}
          </tbody>
        </table>
      </ScrollX>
      {isLoading && !rows && <Notice>Loading…</Notice>}
      {!isLoading && rows?.length === 0 && <Notice>{empty}</Notice>}
      <nav aria-label={`${caption} pages`} className="flex flex-wrap items-center gap-3 text-sm">
        <Button variant="quiet" disabled={view.page <= 1} onClick={() => table.previousPage()}>
          Previous
        </Button>
        <span>
          Page {view.page} of {pages} · {total} in all
        </span>
        <Button variant="quiet" disabled={view.page >= pages} onClick={() => table.nextPage()}>
          Next
        </Button>
        <label className="ml-auto flex items-center gap-2">
          Rows per page
          <select
            className="rounded-md border border-ink-faint bg-white px-2 py-1"
            value={view.pageSize}
            onChange={(e) => table.setPageSize(Number(e.target.value))}
          >
            {[10, 20, 50, 100].map((n) => (
              <option key={n}>{n}</option>
            ))}
          </select>
        </label>
      </nav>
    </div>
  );
}
