import { zodResolver } from '@hookform/resolvers/zod';
import { useEffect } from 'react';
import { useForm } from 'react-hook-form';
import { z } from 'zod';
import type { Preset } from '../../../../shared/schemas/preset';
import { presetInputSchema } from '../../../../shared/schemas/preset';
import { Button } from '../../../components/ui/button';
import { Notice } from '../../../components/ui/notice';
import { TextField } from '../../../components/ui/text-field';
import type { useDesignPresets } from '../hooks/use-design-presets';

// The preset's own fields from the shared schema; its settings come from the design form.
const namingSchema = presetInputSchema.pick({ name: true, description: true });
type Naming = z.input<typeof namingSchema>;

interface NewPresetFormProps {
  id: string;
  presets: ReturnType<typeof useDesignPresets>;
  onDone: (preset: Preset) => void;
  onCancel: () => void;
}

/** Names the design on screen and saves it as a new preset of the current team (the face is not saved). */
export function NewPresetForm({ id, presets, onDone, onCancel }: NewPresetFormProps) {
  const form = useForm<Naming>({ resolver: zodResolver(namingSchema), defaultValues: { name: '', description: '' } });
  // The form opens where the name is typed.
  useEffect(() => form.setFocus('name'), [form]);
  const { errors, isSubmitting } = form.formState;
  const submit = form.handleSubmit(async (fields) => {
    try {
      onDone(await presets.saveNew({ name: fields.name, description: fields.description }));
    } catch (error) {
      form.setError('root', { message: error instanceof Error ? error.message : 'The preset was not saved.' });
    }
  });
  return (
    <form
      id={id}
      aria-label="Save as a new preset"
      noValidate
      onSubmit={submit}
      className="space-y-3 rounded-md border border-ink-faint bg-white p-3"
    >
      <TextField label="Preset name" registration={form.register('name')} error={errors.name} autoComplete="off" />
      <TextField
        label="Description (optional)"
        registration={form.register('description')}
        error={errors.description}
        hint="What it is for, e.g. the part and the printer."
      />
      <p className="text-sm text-ink-soft">
        Everything but the face is saved: joint, material, fit, clearance, printer profile and key or rail sizes.
      </p>
      {errors.root?.message && <Notice tone="error">{errors.root.message}</Notice>}
      <div className="flex flex-wrap gap-2">
        <Button type="submit" disabled={isSubmitting}>
          {isSubmitting ? 'Saving…' : 'Save preset'}
        </Button>
        <Button variant="quiet" onClick={onCancel}>
          Cancel
        </Button>
      </div>
    </form>
  );
}
