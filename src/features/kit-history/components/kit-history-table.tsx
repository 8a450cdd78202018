import { useMemo, useState } from 'react';
import type { KitCheck, KitHistoryItem } from '../../../../shared/schemas/kit-history';
import { materialSchema } from '../../../../shared/schemas/joint-options';
import { Button } from '../../../components/ui/button';
import { DataTable, type DataTableColumn, type ListView } from '../../../components/ui/data-table';
import { Notice } from '../../../components/ui/notice';
import { downloadKit, useCheckKit, useKitHistory } from '../api/kit-history';

const control = 'rounded-md border border-ink-faint bg-white px-2 py-2';

function CheckResult({ teamId, kitId, check }: { teamId: string; kitId: string; check: KitCheck }) {
  const [error, setError] = useState<string | null>(null);
  const get = (variant: 'current' | 'original') =>
    downloadKit(teamId, kitId, variant).catch((e: Error) => setError(e.message));
  return (
    <Notice tone={check.identical ? 'success' : 'warning'}>
      <p>{check.message}</p>
      <div className="mt-2 flex flex-wrap gap-2">
        {check.identical ? (
          <Button onClick={() => get('current')}>Download again</Button>
        ) : (
          <>
            <Button variant="quiet" onClick={() => get('original')}>
              Download the original
            </Button>
            <Button onClick={() => get('current')}>Download as built now ({check.currentEngine})</Button>
          </>
        )}
      </div>
      {error && (
        <p role="alert" className="mt-2 font-medium text-kiln">
          {error}
        </p>
      )}
    </Notice>
  );
}

/** Every kit the team downloaded: who, when, preset and version, printer and calibration; re-download with a byte check. */
export function KitHistoryTable({ teamId, printers }: { teamId: string; printers: { id: string; name: string }[] }) {
  const [view, setView] = useState<ListView>({ sort: 'createdAt', order: 'desc', page: 1, pageSize: 20 });
  const [filters, setFilters] = useState<{
    q?: string;
    joint?: 'key' | 'dovetail';
    material?: string;
    printer?: string;
  }>({});
  const { data, isPending, error } = useKitHistory(teamId, {
    ...view,
    sort: view.sort as 'createdAt',
    ...filters,
  } as never);
  const check = useCheckKit(teamId);
  const filter = (patch: typeof filters) => {
    setFilters((f) => ({ ...f, ...patch }));
    setView((v) => ({ ...v, page: 1 }));
  };
  const columns = useMemo<DataTableColumn<KitHistoryItem>[]>(
    () => [
      {
        id: 'createdAt',
        accessorKey: 'createdAt',
        header: 'When',
        cell: ({ row }) => new Date(row.original.createdAt).toLocaleString(),
      },
      {
        id: 'user',
        header: 'Who',
        enableSorting: false,
        cell: ({ row }) => row.original.user?.name ?? 'a former member',
      },
      {
        id: 'preset',
        header: 'Preset',
        enableSorting: false,
        cell: ({ row }) =>
          row.original.presetName ? `${row.original.presetName} v${row.original.presetVersion}` : '—',
      },
      {
        id: 'joint',
        header: 'Joint',
        enableSorting: false,
        cell: ({ row }) => {
          const s = row.original.summary;
          return `${s.joint}, ${s.material} ${s.fit}, ${s.clearancePerSide} mm per side`;
        },
      },
      {
        id: 'printer',
        header: 'Printer',
        enableSorting: false,
        cell: ({ row }) => row.original.printerProfileName ?? '—',
      },
      { id: 'fileName', accessorKey: 'fileName', header: 'File' },
      {
        id: 'actions',
        header: () => <span className="sr-only">Actions</span>,
        enableSorting: false,
        cell: ({ row }) => (
          <Button variant="quiet" disabled={check.isPending} onClick={() => check.mutate(row.original.id)}>
            Check and download
          </Button>
        ),
      },
    ],
    [check],
  );
  return (
    <div className="space-y-4">
      <div className="flex flex-wrap gap-3" role="search">
        <input
          className={control}
          type="search"
          aria-label="Search kits"
          placeholder="File, preset, printer or person"
          value={filters.q ?? ''}
          onChange={(e) => filter({ q: e.target.value })}
        />
        <select
          aria-label="Joint"
          className={control}
          value={filters.joint ?? ''}
          onChange={(e) => filter({ joint: (e.target.value || undefined) as 'key' })}
        >
          <option value="">Any joint</option>
          <option value="key">Keys</option>
          <option value="dovetail">Dovetails</option>
        </select>
        <select
          aria-label="Material"
          className={control}
          value={filters.material ?? ''}
          onChange={(e) => filter({ material: e.target.value || undefined })}
        >
          <option value="">Any material</option>
          {materialSchema.options.map((m) => (
            <option key={m}>{m}</option>
          ))}
        </select>
        <select
          aria-label="Printer"
          className={control}
          value={filters.printer ?? ''}
          onChange={(e) => filter({ printer: e.target.value || undefined })}
        >
          <option value="">Any printer</option>
          {printers.map((p) => (
            <option key={p.id} value={p.id}>
              {p.name}
            </option>
          ))}
        </select>
      </div>
      {check.error && <Notice tone="error">{check.error.message}</Notice>}
      {check.data && check.variables && <CheckResult teamId={teamId} kitId={check.variables} check={check.data} />}
      <DataTable
        caption="Kit history"
        columns={columns}
        list={{ data, isPending, error }}
        view={view}
        onView={setView}
        rowKey={(k) => k.id}
        empty="No kits recorded yet. Kits you download while signed in appear here."
      />
    </div>
  );
}
