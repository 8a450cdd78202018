import { useMemo, useState } from 'react';
import { Link } from 'react-router-dom';
import type { PresetListQuery, PresetSummary } from '../../../../shared/schemas/preset';
import { materialSchema } from '../../../../shared/schemas/joint-options';
import { Button } from '../../../components/ui/button';
import { DataTable, type DataTableColumn, type ListView } from '../../../components/ui/data-table';
import { Notice } from '../../../components/ui/notice';
import { usePresets } from '../api/get-presets';
import { usePresetAction } from '../api/preset-actions';

interface Props {
  teamId: string;
  printers: { id: string; name: string }[];
  canEdit: boolean;
  canDelete: boolean;
}

interface Filters {
  q?: string;
  tag?: string;
  joint?: 'key' | 'dovetail';
  material?: string;
  printer?: string;
  archived?: 'active' | 'archived' | 'all';
}
const selectClass = 'rounded-md border border-ink-faint bg-white px-2 py-2';

/** The team's presets: search and filters on the server, sortable columns, pages, row actions by role. */
export function PresetsTable({ teamId, printers, canEdit, canDelete }: Props) {
  const [view, setView] = useState<ListView>({ sort: 'updatedAt', order: 'desc', page: 1, pageSize: 20 });
  const [filters, setFilters] = useState<Filters>({ archived: 'active' });
  const query = { ...filters, ...view } as PresetListQuery;
  const { data, isPending, error } = usePresets(teamId, query);
  const action = usePresetAction(teamId);
  const filter = (patch: Filters) => {
    setFilters((f) => ({ ...f, ...patch }));
    setView((v) => ({ ...v, page: 1 }));
  };

  const columns = useMemo<DataTableColumn<PresetSummary>[]>(
    () => [
      {
        id: 'name',
        accessorKey: 'name',
        header: 'Name',
        cell: ({ row }) => (
          <Link className="font-medium underline" to={`/presets/${row.original.id}`}>
            {row.original.name}
          </Link>
        ),
      },
      {
        id: 'joint',
        header: 'Joint',
        enableSorting: false,
        cell: ({ row }) => `${row.original.joint}, ${row.original.material} ${row.original.fit}`,
      },
      { id: 'tags', header: 'Tags', enableSorting: false, cell: ({ row }) => row.original.tags.join(', ') },
      {
        id: 'printer',
        header: 'Printer',
        enableSorting: false,
        cell: ({ row }) => row.original.printerProfileName ?? '—',
      },
      { id: 'version', accessorKey: 'version', header: 'Version' },
      {
        id: 'updatedAt',
        accessorKey: 'updatedAt',
        header: 'Saved',
        cell: ({ row }) =>
          `${new Date(row.original.updatedAt).toLocaleDateString()} by ${row.original.updatedBy?.name ?? 'a former member'}`,
      },
      {
        id: 'actions',
        header: () => <span className="sr-only">Actions</span>,
        enableSorting: false,
        cell: ({ row }) => {
          const p = row.original;
          return (
            <div className="flex flex-wrap gap-2">
              {canEdit && (
                <>
                  <Button variant="quiet" onClick={() => action.mutate({ id: p.id, action: 'duplicate' })}>
                    Duplicate
                  </Button>
                  <Button
                    variant="quiet"
                    onClick={() => action.mutate({ id: p.id, action: p.archived ? 'unarchive' : 'archive' })}
                  >
                    {p.archived ? 'Unarchive' : 'Archive'}
                  </Button>
                </>
              )}
              {canDelete && (
                <Button
                  variant="danger"
                  onClick={() =>
                    window.confirm(`Delete "${p.name}" and all its versions?`) &&
                    action.mutate({ id: p.id, action: 'delete' })
                  }
                >
                  Delete
                </Button>
              )}
            </div>
          );
        },
      },
    ],
    [action, canEdit, canDelete],
  );

  return (
    <div className="space-y-4">
      <div className="flex flex-wrap items-end gap-3" role="search">
        <label className="flex flex-col text-sm">
          Search
          <input
            className={selectClass}
            type="search"
            value={filters.q ?? ''}
            onChange={(e) => filter({ q: e.target.value })}
            placeholder="Name, description or tag"
          />
        </label>
        <label className="flex flex-col text-sm">
          Tag
          <input className={selectClass} value={filters.tag ?? ''} onChange={(e) => filter({ tag: e.target.value })} />
        </label>
        <label className="flex flex-col text-sm">
          Joint
          <select
            className={selectClass}
            value={filters.joint ?? ''}
            onChange={(e) => filter({ joint: (e.target.value || undefined) as Filters['joint'] })}
          >
            <option value="">Any</option>
            <option value="key">Keys</option>
            <option value="dovetail">Dovetails</option>
          </select>
        </label>
        <label className="flex flex-col text-sm">
          Material
          <select
            className={selectClass}
            value={filters.material ?? ''}
            onChange={(e) => filter({ material: e.target.value || undefined })}
          >
            <option value="">Any</option>
            {materialSchema.options.map((m) => (
              <option key={m}>{m}</option>
            ))}
          </select>
        </label>
        <label className="flex flex-col text-sm">
          Printer
          <select
            className={selectClass}
            value={filters.printer ?? ''}
            onChange={(e) => filter({ printer: e.target.value || undefined })}
          >
            <option value="">Any</option>
            {printers.map((p) => (
              <option key={p.id} value={p.id}>
                {p.name}
              </option>
            ))}
          </select>
        </label>
        <label className="flex flex-col text-sm">
          Show
          <select
            className={selectClass}
            value={filters.archived}
            onChange={(e) => filter({ archived: e.target.value as Filters['archived'] })}
          >
            <option value="active">In use</option>
            <option value="archived">Archived</option>
            <option value="all">All</option>
          </select>
        </label>
      </div>
      {action.error && <Notice tone="error">{action.error.message} The list shows the presets as they were.</Notice>}
      <DataTable
        caption="Presets"
        columns={columns}
        list={{ data, isPending, error }}
        view={view}
        onView={setView}
        rowKey={(p) => p.id}
        empty={
          filters.q || filters.tag || filters.joint || filters.material || filters.printer
            ? 'No preset matches these filters.'
            : 'No presets yet. Save the settings of a joint you use often as a preset.'
        }
      />
    </div>
  );
}
