import { useId, useState } from 'react';
import { useController, type Control } from 'react-hook-form';
import type { ParsedPresetInput, PresetInput } from '../../../../shared/schemas/preset';

const toTags = (text: string) =>
  text
    .split(',')
    .map((t) => t.trim())
    .filter(Boolean);

type ErrorTree = { message?: string; root?: { message?: string } } | Array<{ message?: string } | undefined>;

/** The list's own error, or the first tag's (a tag too long is reported at tags.N). */
function messageOf(error: unknown): string | undefined {
  const tree = error as ErrorTree | undefined;
  if (!tree) return undefined;
  if (Array.isArray(tree)) return tree.find((e) => e?.message)?.message;
  return tree.message ?? tree.root?.message;
}

/**
 * Tags typed as one line separated by commas, kept in the form as a list. The line is the field's own text, so
 * a loaded preset reads "helmet, glued" and typing a comma never jumps the cursor.
 */
export function TagsField({ control }: { control: Control<PresetInput, unknown, ParsedPresetInput> }) {
  const id = useId();
  const { field, fieldState } = useController({ control, name: 'tags' });
  const [text, setText] = useState(() => (field.value ?? []).join(', '));
  const error = messageOf(fieldState.error);
  return (
    <div className="space-y-1">
      <label htmlFor={id} className="block font-medium">
        Tags
      </label>
      <p id={`${id}-hint`} className="text-sm text-ink-soft">
        Separated by commas, e.g. helmet, glued
      </p>
      <input
        id={id}
        name={field.name}
        ref={field.ref}
        value={text}
        onBlur={field.onBlur}
        onChange={(e) => {
          setText(e.target.value);
          field.onChange(toTags(e.target.value));
        }}
        aria-invalid={error ? true : undefined}
        aria-describedby={error ? `${id}-hint ${id}-error` : `${id}-hint`}
        className={`w-full rounded-md border bg-white px-3 py-2 ${error ? 'border-kiln' : 'border-ink-faint'}`}
      />
      {error && (
        <p id={`${id}-error`} role="alert" className="text-sm font-medium text-kiln">
          {error}
        </p>
      )}
    </div>
  );
}
