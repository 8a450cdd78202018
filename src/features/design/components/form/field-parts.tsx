/** The input style shared by the design form's fields; a red border marks a field with an error. */
export const inputClass = (invalid: boolean) =>
  `w-full rounded-md border bg-white px-3 py-2 text-ink ${invalid ? 'border-kiln' : 'border-ink-faint'}`;

/** A field's error in the schema's words, announced to screen readers. */
export function FieldMessage({ id, message }: { id: string; message?: string }) {
  if (!message) return null;
  return (
    <p id={id} role="alert" className="text-sm font-medium text-kiln">
      {message}
    </p>
  );
}
