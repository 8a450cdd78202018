import { useId } from 'react';
import { useController, type Control, type FieldPath } from 'react-hook-form';
import type { DesignValues } from '../../lib/design-values';
import { FieldMessage } from './field-parts';

interface ChoiceFieldProps {
  control: Control<DesignValues>;
  name: FieldPath<DesignValues>;
  legend: string;
  options: ReadonlyArray<{ value: string; label: string; detail?: string }>;
  /** Lay the choices out in a row on wide screens (default) or one under another. */
  columns?: 1 | 2 | 3;
}

const grid = { 1: 'grid-cols-1', 2: 'grid-cols-1 sm:grid-cols-2', 3: 'grid-cols-1 sm:grid-cols-3' } as const;

/** A group of radio choices drawn as cards: a legend, and a label with a line of explanation per choice. */
export function ChoiceField({ control, name, legend, options, columns = 3 }: ChoiceFieldProps) {
  const id = useId();
  const { field, fieldState } = useController({ control, name });
  return (
    <fieldset className="space-y-2">
      <legend className="font-medium">{legend}</legend>
      <div className={`grid gap-2 ${grid[columns]}`}>
        {options.map((o) => {
          const checked = field.value === o.value;
          return (
            <label
              key={o.value}
              className={`flex cursor-pointer gap-2 rounded-md border-2 bg-white px-3 py-2 has-[:focus-visible]:outline-3 has-[:focus-visible]:outline-offset-2 has-[:focus-visible]:outline-kiln ${checked ? 'border-ink' : 'border-paper-deep'}`}
            >
              <input
                type="radio"
                name={`${id}-${field.name}`}
                value={o.value}
                checked={checked}
                onChange={() => field.onChange(o.value)}
                onBlur={field.onBlur}
                className="mt-1.5 accent-kiln"
              />
              <span>
                <span className="block font-medium">{o.label}</span>
                {o.detail && <span className="block text-sm text-ink-soft">{o.detail}</span>}
              </span>
            </label>
          );
        })}
      </div>
      <FieldMessage id={`${id}-error`} message={fieldState.error?.message} />
    </fieldset>
  );
}
