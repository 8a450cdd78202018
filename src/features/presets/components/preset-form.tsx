import { useId } from 'react';
import { zodResolver } from '@hookform/resolvers/zod';
import { useForm, type Resolver } from 'react-hook-form';
import { presetInputSchema, type ParsedPresetInput, type PresetInput } from '../../../../shared/schemas/preset';
import { Button } from '../../../components/ui/button';
import { Notice } from '../../../components/ui/notice';
import { TextField } from '../../../components/ui/text-field';
import { showApiError } from '../../../lib/form-errors';
import { SettingsFields } from './settings-fields';
import { TagsField } from './tags-field';

interface Props {
  initial: PresetInput;
  printers: { id: string; name: string }[];
  submitLabel: string;
  /** Locks every field and the save button (while a conflict waits for a choice); `disabledReason` says why. */
  disabled?: boolean;
  disabledReason?: string;
  onSubmit: (values: ParsedPresetInput) => Promise<unknown>;
}

const FIELDS = ['name', 'description', 'tags', 'printerProfileId'] as const;

/**
 * A preset's name, description, tags, printer and joint settings, checked by the API's own schema. The page
 * gives it a new React key to load other values (the current version after a conflict).
 */
export function PresetForm({ initial, printers, submitLabel, disabled, disabledReason, onSubmit }: Props) {
  const form = useForm<PresetInput, unknown, ParsedPresetInput>({
    resolver: zodResolver(presetInputSchema) as unknown as Resolver<PresetInput, unknown, ParsedPresetInput>,
    defaultValues: initial,
  });
  const { register, handleSubmit, setError, setValue, formState } = form;
  const printerProfileId = form.watch('printerProfileId');
  const { errors, isSubmitting } = formState;
  const reasonId = useId();
  const submit = handleSubmit(async (values) => {
    try {
      await onSubmit(values);
    } catch (error) {
      showApiError(error, setError, [...FIELDS]);
    }
  });
  return (
    <form onSubmit={submit} noValidate className="space-y-4">
      {errors.root?.message && <Notice tone="error">{errors.root.message}</Notice>}
      {/* One disabled fieldset locks every field at once, so what is saved later is exactly what is shown. */}
      <fieldset disabled={disabled} className="min-w-0 space-y-4">
        <TextField label="Name" registration={register('name')} error={errors.name} />
        <div className="space-y-1">
          <label htmlFor="preset-description" className="block font-medium">
            Description
          </label>
          <textarea
            id="preset-description"
            rows={3}
            className="w-full rounded-md border border-ink-faint bg-white px-3 py-2"
            {...register('description')}
          />
        </div>
        <TagsField control={form.control} />
        <div className="space-y-1">
          <label htmlFor="preset-printer" className="block font-medium">
            Printer profile
          </label>
          <select
            id="preset-printer"
            className="w-full rounded-md border border-ink-faint bg-white px-3 py-2"
            // Controlled: the printers load after the form, and an uncontrolled select would fall back to "None".
            value={printerProfileId ?? ''}
            onChange={(e) => setValue('printerProfileId', e.target.value || null, { shouldDirty: true })}
          >
            <option value="">None</option>
            {printers.map((p) => (
              <option key={p.id} value={p.id}>
                {p.name}
              </option>
            ))}
          </select>
          {errors.printerProfileId?.message && (
            <p role="alert" className="text-sm font-medium text-kiln">
              {errors.printerProfileId.message}
            </p>
          )}
        </div>
        <SettingsFields form={form} />
      </fieldset>
      <div className="flex flex-wrap items-center gap-3">
        <Button
          type="submit"
          disabled={disabled || isSubmitting}
          aria-describedby={disabled && disabledReason ? reasonId : undefined}
        >
          {submitLabel}
        </Button>
        {disabled && disabledReason && (
          <p id={reasonId} className="text-sm text-ink-soft">
            {disabledReason}
          </p>
        )}
      </div>
    </form>
  );
}
