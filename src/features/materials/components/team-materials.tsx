import { zodResolver } from '@hookform/resolvers/zod';
import { useMemo, useState } from 'react';
import { useForm, type Resolver } from 'react-hook-form';
import { materialSchema } from '../../../../shared/schemas/joint-options';
import {
  teamMaterialInputSchema,
  type TeamMaterial,
  type TeamMaterialInput,
} from '../../../../shared/schemas/material';
import { Button } from '../../../components/ui/button';
import { DataTable, type DataTableColumn, type ListView } from '../../../components/ui/data-table';
import { Notice } from '../../../components/ui/notice';
import { TextField } from '../../../components/ui/text-field';
import { showApiError } from '../../../lib/form-errors';
import { useCreateMaterial, useDeleteMaterial, useTeamMaterials } from '../api/materials';

const num = { setValueAs: (v: unknown) => (v === '' || v === null ? null : Number(v)) };

function MaterialForm({ teamId }: { teamId: string }) {
  const create = useCreateMaterial(teamId);
  const { register, handleSubmit, setError, reset, formState } = useForm<TeamMaterialInput>({
    resolver: zodResolver(teamMaterialInputSchema) as unknown as Resolver<TeamMaterialInput>,
    defaultValues: {
      name: '',
      baseMaterial: 'PLA',
      shrinkagePercent: null,
      clearanceAdjustments: { press: 0, snug: 0, slide: 0 },
      notes: '',
    },
  });
  const { errors, isSubmitting } = formState;
  const submit = handleSubmit(async (values) => {
    try {
      await create.mutateAsync(values);
      reset();
    } catch (error) {
      showApiError(error, setError, ['name', 'shrinkagePercent']);
    }
  });
  return (
    <form onSubmit={submit} noValidate className="grid max-w-3xl gap-3 sm:grid-cols-2">
      {errors.root?.message && (
        <div className="sm:col-span-2">
          <Notice tone="error">{errors.root.message}</Notice>
        </div>
      )}
      <TextField label="Name" registration={register('name')} error={errors.name} />
      <label className="flex flex-col gap-1">
        <span className="font-medium">Base material</span>
        <select className="rounded-md border border-ink-faint bg-white px-3 py-2" {...register('baseMaterial')}>
          {materialSchema.options.map((m) => (
            <option key={m}>{m}</option>
          ))}
        </select>
      </label>
      <TextField
        label="Shrinkage, % (empty: the base’s)"
        type="number"
        step="any"
        registration={register('shrinkagePercent', num)}
        error={errors.shrinkagePercent}
      />
      {(['press', 'snug', 'slide'] as const).map((fit) => (
        <TextField
          key={fit}
          label={`${fit} clearance adjustment, mm`}
          type="number"
          step="0.01"
          registration={register(`clearanceAdjustments.${fit}`, num)}
          error={errors.clearanceAdjustments?.[fit]}
        />
      ))}
      <div className="sm:col-span-2">
        <Button type="submit" disabled={isSubmitting}>
          Add material
        </Button>
      </div>
    </form>
  );
}

/** The team's own materials: a table with search, base filter and pages, and a form to add one. */
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
        cell: ({ row }) =>
          canDelete && (
            <Button
              variant="danger"
              onClick={() => window.confirm(`Delete "${row.original.name}"?`) && remove.mutate(row.original.id)}
            >
              Delete
            </Button>
          ),
      },
    ],
    [canDelete, remove],
  );
  return (
    <div className="space-y-4">
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
        rows={data?.items}
        total={data?.total ?? 0}
        view={view}
        onView={setView}
        isLoading={isPending}
        error={error}
        rowKey={(m) => m.id}
        empty={q ? 'No material matches.' : 'No team materials yet.'}
      />
      {canEdit && <MaterialForm teamId={teamId} />}
    </div>
  );
}
