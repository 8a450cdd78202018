import { useId, type InputHTMLAttributes } from 'react';
import type { FieldError, UseFormRegisterReturn } from 'react-hook-form';

interface TextFieldProps extends Omit<InputHTMLAttributes<HTMLInputElement>, 'name'> {
  label: string;
  registration: UseFormRegisterReturn;
  error?: FieldError;
  hint?: string;
}

/** A labelled input with its hint and error beside it; the error is announced to screen readers. */
export function TextField({ label, registration, error, hint, ...input }: TextFieldProps) {
  const id = useId();
  const describedBy = [hint ? `${id}-hint` : null, error ? `${id}-error` : null].filter(Boolean).join(' ');
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
      <input
        id={id}
        {...input}
        {...registration}
        aria-invalid={error ? true : undefined}
        aria-describedby={describedBy || undefined}
        className={`w-full rounded-md border bg-white px-3 py-2 ${error ? 'border-kiln' : 'border-ink-faint'}`}
      />
      {error?.message && (
        <p id={`${id}-error`} role="alert" className="text-sm font-medium text-kiln">
          {error.message}
        </p>
      )}
    </div>
  );
}
