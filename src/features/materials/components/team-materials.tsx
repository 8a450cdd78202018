import { useMemo, useState } from 'react';
import type { TeamMaterial } from '../../../../shared/schemas/material';
import { Button } from '../../../components/ui/button';
import { DataTable, type DataTableColumn, type ListView } from '../../../components/ui/data-table';
import { Notice } from '../../../components/ui/notice';
import { useCreateMaterial, useDeleteMaterial, useTeamMaterials } from '../api/materials';
import { useUpdateMaterial } from '../api/update-material';
import { materialChanges, materialFormValues } from '../lib/material-changes';
import { MaterialForm, NEW_MATERIAL } from './material-form';

function AddMaterial({ teamId }: { teamId: string }) {
  const create = useCreateMaterial(teamId);
  return (
    <section aria-labelledby="add-material" className="space-y-2">
      <h3 id="add-material" className="font-bold">
        Add a material
      </h3>
      <MaterialForm
        values={NEW_MATERIAL}
        submitLabel="Add material"
        clearAfterSave
        onSave={async (values) => {
          await create.mutateAsync(values);
        }}
      />
    </section>
  );
}

function EditMaterial({ teamId, material, onDone }: { teamId: string; material: TeamMaterial; onDone: () => void }) {
  const update = useUpdateMaterial(teamId);
  return (
    <section aria-labelledby="edit-material" className="space-y-2">
      <h3 id="edit-material" className="font-bold">
        Edit “{material.name}”
      </h3>
      <MaterialForm
        values={materialFormValues(material)}
        submitLabel="Save changes"
        focusName
        onCancel={onDone}
        onSave={async (values) => {
          const patch = materialChanges(material, values);
          if (Object.keys(patch).length > 0) await update.mutateAsync({ id: material.id, patch });
          onDone();
        }}
      />
    </section>
  );
}

/**
 * The team's own materials: a table with search and pages; editors and owners add and edit them, owners
 * delete them. Says how the fit engine uses a team material.
 */
export function TeamMaterials({
  teamId,
  canEdit,
  canDelete,
}: {
  teamId: string;
  canEdit: boolean;
  canDelete: boolean;
}) {
  const [view, setView] = useState<ListView>({ sort: 'name', order: 'asc', page: 1, pageSize: 20 });
  const [q, setQ] = useState('');
  const { data, isPending, error } = useTeamMaterials(teamId, { ...view, sort: view.sort as 'name', q });
  const remove = useDeleteMaterial(teamId);
  const [editing, setEditing] = useState<TeamMaterial | null>(null);
  const columns = useMemo<DataTableColumn<TeamMaterial>[]>(
    () => [
      { id: 'name', accessorKey: 'name', header: 'Name' },
      { id: 'base', header: 'Base', enableSorting: false, cell: ({ row }) => row.original.baseMaterial },
      {
        id: 'shrinkage',
        header: 'Shrinkage',
        enableSorting: false,
        cell: ({ row }) =>
          row.original.shrinkagePercent === null ? 'the base’s' : `${row.original.shrinkagePercent} %`,
      },
      {
        id: 'adjust',
        header: 'Clearance adjustments',
        enableSorting: false,
        cell: ({ row }) =>
          Object.entries(row.original.clearanceAdjustments)
            .map(([fit, mm]) => `${fit} ${mm} mm`)
            .join(', '),
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
            {canEdit && (
              <Button variant="quiet" onClick={() => setEditing(row.original)}>
                Edit<span className="sr-only"> {row.original.name}</span>
              </Button>
            )}
            {canDelete && (
              <Button
                variant="danger"
                onClick={() => {
                  if (!window.confirm(`Delete "${row.original.name}"?`)) return;
                  // A material deleted while its edit form is open has nothing left to save.
                  setEditing((open) => (open?.id === row.original.id ? null : open));
                  remove.mutate(row.original.id);
                }}
              >
                Delete<span className="sr-only"> {row.original.name}</span>
              </Button>
            )}
          </div>
        ),
      },
    ],
    [canEdit, canDelete, remove],
  );
  return (
    <div className="space-y-4">
      <p className="max-w-3xl text-ink-soft">
        A team material is a variant of a built-in one: a particular spool or resin your studio prints with. When
        someone chooses it on the design screen, the fit engine uses its clearance adjustment for the kit’s fit class in
        place of the base material’s, and the kit’s fit derivation names it.
      </p>
      <input
        className="rounded-md border border-ink-faint bg-white px-3 py-2"
        type="search"
        aria-label="Search materials"
        placeholder="Search name or notes"
        value={q}
        onChange={(e) => {
          setQ(e.target.value);
          setView({ ...view, page: 1 });
        }}
      />
      {remove.error && <Notice tone="error">{remove.error.message}</Notice>}
      <DataTable
        caption="Team materials"
        columns={columns}
        list={{ data, isPending, error }}
        view={view}
        onView={setView}
        rowKey={(m) => m.id}
        empty={q ? 'No material matches.' : 'No team materials yet.'}
      />
      {canEdit && editing && (
        <EditMaterial key={editing.id} teamId={teamId} material={editing} onDone={() => setEditing(null)} />
      )}
      {canEdit && !editing && <AddMaterial teamId={teamId} />}
    </div>
  );
}
