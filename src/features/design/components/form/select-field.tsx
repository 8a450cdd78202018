import { useId } from 'react';
import { useController, type Control, type FieldPath } from 'react-hook-form';
import type { DesignValues } from '../../lib/design-values';
import { FieldMessage, inputClass } from './field-parts';

interface SelectFieldProps {
  control: Control<DesignValues>;
  name: FieldPath<DesignValues>;
  label: string;
  options: ReadonlyArray<{ value: string; label: string }>;
  hint?: string;
  onPicked?: (value: string) => void;
}

/** A labelled drop-down bound to the form. */
export function SelectField({ control, name, label, options, hint, onPicked }: SelectFieldProps) {
  const id = useId();
  const { field, fieldState } = useController({ control, name });
  const error = fieldState.error?.message;
  return (
    <div className="space-y-1">
      <label htmlFor={id} className="block font-medium">
        {label}
      </label>
      {hint && (
        <p id={`${id}-hint`} className="text-sm text-ink-soft">
          {hint}
        </p>
      )}
      <select
        id={id}
        name={field.name}
        ref={field.ref}
        value={String(field.value ?? '')}
        onBlur={field.onBlur}
        onChange={(e) => {
          field.onChange(e.target.value);
          onPicked?.(e.target.value);
        }}
        aria-describedby={[hint ? `${id}-hint` : '', error ? `${id}-error` : ''].join(' ').trim() || undefined}
        aria-invalid={error ? true : undefined}
        className={inputClass(Boolean(error))}
      >
        {options.map((o) => (
          <option key={o.value} value={o.value}>
            {o.label}
          </option>
        ))}
      </select>
      <FieldMessage id={`${id}-error`} message={error} />
    </div>
  );
}
