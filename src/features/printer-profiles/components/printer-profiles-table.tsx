import { useMemo, useState } from 'react';
import { Link } from 'react-router-dom';
import type { PrinterProfile } from '../../../../shared/schemas/printer-profile';
import { Button } from '../../../components/ui/button';
import { DataTable, type DataTableColumn, type ListView } from '../../../components/ui/data-table';
import { Notice } from '../../../components/ui/notice';
import { usePrinterProfiles } from '../api/printer-profiles';
import { useDeletePrinterProfile } from '../api/save-printer-profile';

interface Props {
  teamId: string;
  canEdit: boolean;
  canDelete: boolean;
  onEdit: (profile: PrinterProfile) => void;
}

const mm = (n: number) => `${n} mm`;

/** The team's printers with search, a process filter, sortable columns and pages. */
export function PrinterProfilesTable({ teamId, canEdit, canDelete, onEdit }: Props) {
  const [view, setView] = useState<ListView>({ sort: 'name', order: 'asc', page: 1, pageSize: 20 });
  const [q, setQ] = useState('');
  const [process, setProcess] = useState<'' | 'fdm' | 'resin'>('');
  const { data, isPending, error } = usePrinterProfiles(teamId, {
    ...view,
    sort: view.sort as 'name',
    q,
    process: process || undefined,
  });
  const remove = useDeletePrinterProfile(teamId);
  const columns = useMemo<DataTableColumn<PrinterProfile>[]>(
    () => [
      { id: 'name', accessorKey: 'name', header: 'Name' },
      {
        id: 'process',
        header: 'Process',
        enableSorting: false,
        cell: ({ row }) => (row.original.process === 'fdm' ? 'FDM' : 'Resin'),
      },
      {
        id: 'volume',
        header: 'Build volume',
        enableSorting: false,
        cell: ({ row }) => {
          const v = row.original.buildVolume;
          return `${v.x} × ${v.y} × ${v.z} mm`;
        },
      },
      {
        id: 'nozzle',
        header: 'Nozzle / layer',
        enableSorting: false,
        cell: ({ row }) =>
          `${row.original.nozzleDiameter ? mm(row.original.nozzleDiameter) : '—'} / ${mm(row.original.layerHeight)}`,
      },
      {
        id: 'calibration',
        header: 'Calibration',
        enableSorting: false,
        cell: ({ row }) =>
          row.original.calibration
            .map((c) => `${c.material} ${c.fit} ${c.offsetMm > 0 ? '+' : ''}${c.offsetMm} mm (${c.measuredOn})`)
            .join('; ') || 'none yet',
      },
      {
        id: 'updatedAt',
        accessorKey: 'updatedAt',
        header: 'Changed',
        cell: ({ row }) => new Date(row.original.updatedAt).toLocaleDateString(),
      },
      {
        id: 'actions',
        header: () => <span className="sr-only">Actions</span>,
        enableSorting: false,
        cell: ({ row }) => (
          <div className="flex gap-2">
            <Link
              to={`/printers/${row.original.id}/fit-tests`}
              className="rounded-md border border-ink-faint px-4 py-2 font-medium text-ink hover:bg-paper-deep"
              aria-label={`Fit tests of ${row.original.name}`}
            >
              Fit tests
            </Link>
            {canEdit && (
              <Button variant="quiet" onClick={() => onEdit(row.original)}>
                Edit
              </Button>
            )}
            {canDelete && (
              <Button
                variant="danger"
                onClick={() =>
                  window.confirm(`Delete printer profile "${row.original.name}"?`) && remove.mutate(row.original.id)
                }
              >
                Delete
              </Button>
            )}
          </div>
        ),
      },
    ],
    [canEdit, canDelete, onEdit, remove],
  );
  return (
    <div className="space-y-3">
      <div className="flex flex-wrap gap-3" role="search">
        <input
          className="rounded-md border border-ink-faint bg-white px-3 py-2"
          type="search"
          aria-label="Search printers"
          placeholder="Search name or notes"
          value={q}
          onChange={(e) => {
            setQ(e.target.value);
            setView({ ...view, page: 1 });
          }}
        />
        <select
          aria-label="Process"
          className="rounded-md border border-ink-faint bg-white px-2"
          value={process}
          onChange={(e) => {
            setProcess(e.target.value as typeof process);
            setView({ ...view, page: 1 });
          }}
        >
          <option value="">FDM and resin</option>
          <option value="fdm">FDM</option>
          <option value="resin">Resin</option>
        </select>
      </div>
      {remove.error && <Notice tone="error">{remove.error.message}</Notice>}
      <DataTable
        caption="Printer profiles"
        columns={columns}
        list={{ data, isPending, error }}
        view={view}
        onView={setView}
        rowKey={(p) => p.id}
        empty={
          q || process
            ? 'No printer matches.'
            : 'No printer profiles yet. Add your printers so the fit engine can use their calibration.'
        }
      />
    </div>
  );
}
