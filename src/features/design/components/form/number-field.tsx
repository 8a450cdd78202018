import { useEffect, useId, useState } from 'react';
import { useController, type Control, type FieldPath } from 'react-hook-form';
import type { DesignValues } from '../../lib/design-values';
import { formatLength, parseLength, type LengthUnit } from '../../lib/units';
import { FieldMessage, inputClass } from './field-parts';

interface NumberFieldProps {
  control: Control<DesignValues>;
  name: FieldPath<DesignValues>;
  label: string;
  /** A length shown and typed in this unit (stored in mm); omit for counts, ratios and scales. */
  unit?: LengthUnit;
  /** Unit word shown for plain numbers, e.g. "°" or ":1". */
  suffix?: string;
  hint?: string;
  /** Placeholder when the field may be left empty (the schema's default applies). */
  placeholder?: string;
}

const show = (value: unknown, unit: LengthUnit | undefined): string => {
  if (typeof value !== 'number' || Number.isNaN(value)) return '';
  return unit ? formatLength(value, unit) : String(value);
};

/**
 * A number input bound to the form. Lengths are typed in the chosen unit and stored in mm, so switching
 * units re-displays the same stored value instead of converting it back and forth. Empty = unset.
 */
export function NumberField({ control, name, label, unit, suffix, hint, placeholder }: NumberFieldProps) {
  const id = useId();
  const { field, fieldState } = useController({ control, name });
  const [text, setText] = useState(() => show(field.value, unit));

  // Outside changes (a unit switch, a preset, a reset) re-display the stored value; typing does not
  // fight the cursor because the text already parses to that value.
  useEffect(() => {
    const typed = unit ? parseLength(text, unit) : text.trim() === '' ? undefined : Number(text);
    if (typed !== field.value && !(Number.isNaN(typed) && Number.isNaN(field.value))) setText(show(field.value, unit));
  }, [field.value, unit]);

  const error = fieldState.error?.message;
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
      <div className="flex items-center gap-2">
        <input
          id={id}
          name={field.name}
          ref={field.ref}
          type="text"
          inputMode="decimal"
          autoComplete="off"
          value={text}
          placeholder={placeholder}
          onBlur={field.onBlur}
          onChange={(e) => {
            setText(e.target.value);
            const t = e.target.value;
            field.onChange(unit ? parseLength(t, unit) : t.trim() === '' ? undefined : Number(t.replace(',', '.')));
          }}
          aria-invalid={error ? true : undefined}
          aria-describedby={describedBy || undefined}
          className={inputClass(Boolean(error))}
        />
        {(unit ?? suffix) && <span className="min-w-8 text-ink-soft">{unit ?? suffix}</span>}
      </div>
      <FieldMessage id={`${id}-error`} message={error} />
    </div>
  );
}
