import { zodResolver } from '@hookform/resolvers/zod';
import { useEffect } from 'react';
import { useForm, type Path, type Resolver } from 'react-hook-form';
import { materialSchema } from '../../../../shared/schemas/joint-options';
import {
  teamMaterialInputSchema,
  type ParsedTeamMaterialInput,
  type TeamMaterialInput,
} from '../../../../shared/schemas/material';
import { Button } from '../../../components/ui/button';
import { Notice } from '../../../components/ui/notice';
import { TextField } from '../../../components/ui/text-field';
import { ApiError } from '../../../lib/api-client';
import { showApiError } from '../../../lib/form-errors';

const num = { setValueAs: (v: unknown) => (v === '' || v === null ? null : Number(v)) };
const fits = ['press', 'snug', 'slide'] as const;
// Every field an API issue can point at, so its message shows beside that field.
const fields: Path<TeamMaterialInput>[] = [
  'name',
  'baseMaterial',
  'shrinkagePercent',
  'clearanceAdjustments.press',
  'clearanceAdjustments.snug',
  'clearanceAdjustments.slide',
  'notes',
];

/** An empty team material: PLA, the base's shrinkage, no adjustments. */
export const NEW_MATERIAL: TeamMaterialInput = {
  name: '',
  baseMaterial: 'PLA',
  shrinkagePercent: null,
  clearanceAdjustments: { press: 0, snug: 0, slide: 0 },
  notes: '',
};

interface MaterialFormProps {
  /** The starting values (a new material, or the one being edited). */
  values: TeamMaterialInput;
  submitLabel: string;
  /** Saves the checked values; a thrown ApiError is shown beside its field. */
  onSave: (values: ParsedTeamMaterialInput) => Promise<void>;
  /** Shown as a Cancel button when given. */
  onCancel?: () => void;
  /** Empty the form after a save (adding), or keep the saved values (editing). */
  clearAfterSave?: boolean;
  /** Put the cursor in the name field when the form opens (editing). */
  focusName?: boolean;
}

/**
 * A team material's fields on the shared schema (`teamMaterialInputSchema`): the schema's messages and the
 * server's appear beside their field; a name already used in the team appears beside the name.
 */
export function MaterialForm({ values, submitLabel, onSave, onCancel, clearAfterSave, focusName }: MaterialFormProps) {
  const { register, handleSubmit, setError, reset, setFocus, formState } = useForm<TeamMaterialInput>({
    resolver: zodResolver(teamMaterialInputSchema) as unknown as Resolver<TeamMaterialInput>,
    defaultValues: values,
  });
  const { errors, isSubmitting } = formState;
  useEffect(() => {
    if (focusName) setFocus('name');
  }, [focusName, setFocus]);
  const submit = handleSubmit(async (input) => {
    try {
      // The resolver has parsed the values with the schema (trimmed, defaults applied).
      await onSave(input as ParsedTeamMaterialInput);
      if (clearAfterSave) reset();
    } catch (error) {
      if (error instanceof ApiError && error.code === 'CONFLICT') setError('name', { message: error.message });
      else showApiError(error, setError, fields);
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
      {fits.map((fit) => (
        <TextField
          key={fit}
          label={`${fit} clearance adjustment, mm per side`}
          hint="Added to the published clearance in place of the base material’s; −0.5 to 0.5."
          type="number"
          step="0.01"
          registration={register(`clearanceAdjustments.${fit}`, num)}
          error={errors.clearanceAdjustments?.[fit]}
        />
      ))}
      <div className="sm:col-span-2">
        <TextField label="Notes" registration={register('notes')} error={errors.notes} />
      </div>
      <div className="flex gap-2 sm:col-span-2">
        <Button type="submit" disabled={isSubmitting}>
          {submitLabel}
        </Button>
        {onCancel && (
          <Button variant="quiet" onClick={onCancel}>
            Cancel
          </Button>
        )}
      </div>
    </form>
  );
}
