import { useEffect, useId, useState } from 'react';
import { useController, type Control } from 'react-hook-form';
import type { DesignValues } from '../../lib/design-values';
import { formatLength, parseLength, type LengthUnit } from '../../lib/units';
import { FieldMessage, inputClass } from './field-parts';

type Points = Array<[number, number]>;

const show = (points: Points | undefined, unit: LengthUnit) =>
  (points ?? []).map(([x, y]) => `${formatLength(x, unit)}, ${formatLength(y, unit)}`).join('\n');

/** Every number in pasted text, in pairs: "x, y" per line, "x y", or a JSON list of pairs all work. */
function parsePoints(text: string, unit: LengthUnit): { points: Points; problem?: string } {
  const numbers = text.match(/-?\d+(?:[.,]\d+)?(?:e-?\d+)?/gi) ?? [];
  if (numbers.length % 2 === 1)
    return { points: [], problem: 'Each point needs an x and a y: one number is left over.' };
  const points: Points = [];
  for (let i = 0; i < numbers.length; i += 2) {
    points.push([parseLength(numbers[i]!, unit) ?? NaN, parseLength(numbers[i + 1]!, unit) ?? NaN]);
  }
  return { points };
}

/** The polygon face's corners, typed or pasted one "x, y" pair per line in the chosen unit. */
export function PointsField({ control, unit }: { control: Control<DesignValues>; unit: LengthUnit }) {
  const id = useId();
  const { field, fieldState } = useController({ control, name: 'face.points' });
  const [text, setText] = useState(() => show(field.value as Points, unit));
  const [problem, setProblem] = useState<string>();

  useEffect(() => {
    const typed = parsePoints(text, unit).points;
    if (JSON.stringify(typed) !== JSON.stringify(field.value)) setText(show(field.value as Points, unit));
    // Re-display only when the stored points or the unit change from outside.
  }, [field.value, unit]);

  const error = problem ?? fieldState.error?.message;
  return (
    <div className="space-y-1">
      <label htmlFor={id} className="block font-medium">
        Corner points ({unit})
      </label>
      <p id={`${id}-hint`} className="text-sm text-ink-soft">
        One corner per line as “x, y”, going round the outline. Pasting a list of pairs works too.
      </p>
      <textarea
        id={id}
        name={field.name}
        ref={field.ref}
        rows={6}
        value={text}
        spellCheck={false}
        onBlur={field.onBlur}
        onChange={(e) => {
          setText(e.target.value);
          const parsed = parsePoints(e.target.value, unit);
          setProblem(parsed.problem);
          field.onChange(parsed.points);
        }}
        aria-invalid={error ? true : undefined}
        aria-describedby={`${id}-hint${error ? ` ${id}-error` : ''}`}
        className={`${inputClass(Boolean(error))} font-mono text-base`}
      />
      <FieldMessage id={`${id}-error`} message={error} />
    </div>
  );
}
