import { useId } from 'react';
import type { UseFormReturn } from 'react-hook-form';
import type { PresetInput } from '../../../../shared/schemas/preset';
import { fitClassSchema, materialSchema } from '../../../../shared/schemas/joint-options';
import { keyShapeSchema } from '../../../../shared/schemas/kit-key-options';

type Form = UseFormReturn<PresetInput>;
const inputClass = 'w-full rounded-md border border-ink-faint bg-white px-3 py-2';
// Empty number boxes mean "not set" (the schema's default applies), not NaN.
const optionalNumber = {
  setValueAs: (v: unknown) => (v === '' || v === null || v === undefined ? undefined : Number(v)),
};

function errorAt(form: Form, path: string): string | undefined {
  let node: unknown = form.formState.errors;
  for (const part of path.split('.')) node = (node as Record<string, unknown> | undefined)?.[part];
  return (node as { message?: string } | undefined)?.message;
}

function NumberField({ form, path, label }: { form: Form; path: string; label: string }) {
  const message = errorAt(form, path);
  const id = useId();
  return (
    <div className="flex flex-col gap-1 text-sm">
      <label htmlFor={id} className="font-medium">
        {label}
      </label>
      <input
        id={id}
        className={inputClass}
        type="number"
        step="any"
        aria-invalid={message ? true : undefined}
        {...form.register(path as 'name', optionalNumber)}
      />
      {message && (
        <span role="alert" className="font-medium text-kiln">
          {message}
        </span>
      )}
    </div>
  );
}

function Select({
  form,
  path,
  label,
  options,
}: {
  form: Form;
  path: string;
  label: string;
  options: readonly string[];
}) {
  const id = useId();
  return (
    <div className="flex flex-col gap-1 text-sm">
      <label htmlFor={id} className="font-medium">
        {label}
      </label>
      <select id={id} className={inputClass} {...form.register(path as 'name')}>
        {options.map((o) => (
          <option key={o}>{o}</option>
        ))}
      </select>
      {errorAt(form, path) && (
        <span role="alert" className="font-medium text-kiln">
          {errorAt(form, path)}
        </span>
      )}
    </div>
  );
}

/**
 * The joint settings of a preset: the common ones as fields; anything else the preset holds (chamfers, gaps,
 * strategy…) is kept as it is and saved with it.
 */
export function SettingsFields({ form }: { form: Form }) {
  const joint = form.watch('settings.joint');
  const shape = form.watch('settings.key.shape' as 'name');
  return (
    <fieldset className="grid gap-4 rounded-card border border-paper-deep p-4 sm:grid-cols-3">
      <legend className="px-1 font-bold">Joint settings</legend>
      <Select form={form} path="settings.joint" label="Joint" options={['key', 'dovetail']} />
      <Select form={form} path="settings.material" label="Material" options={materialSchema.options} />
      <Select form={form} path="settings.fit" label="Fit" options={fitClassSchema.options} />
      <NumberField
        form={form}
        path="settings.clearance"
        label="Clearance per side, mm (empty: the fit engine chooses)"
      />
      {joint === 'key' ? (
        <>
          <Select form={form} path="settings.key.shape" label="Key shape" options={keyShapeSchema.options} />
          <NumberField form={form} path="settings.key.width" label="Key width, mm" />
          {shape === 'rect' && <NumberField form={form} path="settings.key.length" label="Key length, mm" />}
          <NumberField form={form} path="settings.key.depth" label="Key depth, mm" />
          <NumberField form={form} path="settings.key.count" label="Key count (empty: as many as fit)" />
        </>
      ) : (
        <>
          <NumberField form={form} path="settings.dovetail.rootWidth" label="Root width, mm" />
          <NumberField form={form} path="settings.dovetail.height" label="Height, mm" />
          <NumberField form={form} path="settings.dovetail.slope" label="Slope 1:n (empty: 1:6)" />
          <NumberField form={form} path="settings.dovetail.count" label="Rails" />
        </>
      )}
      {errorAt(form, 'settings') && (
        <p role="alert" className="text-sm font-medium text-kiln sm:col-span-3">
          {errorAt(form, 'settings')}
        </p>
      )}
    </fieldset>
  );
}
