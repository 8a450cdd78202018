import { useId } from 'react';
import type { FieldErrors, UseFormRegister } from 'react-hook-form';
import { fitClassSchema, materialSchema } from '../../../../shared/schemas/joint-options';
import type { CalibrationEntryInput, PrinterProfileInput } from '../../../../shared/schemas/printer-profile';
import { Button } from '../../../components/ui/button';

const cell = 'rounded-md border bg-white px-2 py-1';
const num = { setValueAs: (v: unknown) => (v === '' || v === null ? null : Number(v)) };
type Field = keyof CalibrationEntryInput;

/**
 * One row of the calibration table: material, fit, offset, date and source. Each input is marked invalid and
 * described by its own message, as a TextField is.
 */
export function CalibrationRow({
  index,
  register,
  errors,
  onRemove,
}: {
  index: number;
  register: UseFormRegister<PrinterProfileInput>;
  errors?: FieldErrors<CalibrationEntryInput>;
  onRemove: () => void;
}) {
  const id = useId();
  const messageOf = (field: Field) => errors?.[field]?.message;
  const a11y = (field: Field) => ({
    'aria-invalid': messageOf(field) ? true : undefined,
    'aria-describedby': messageOf(field) ? `${id}-${field}-error` : undefined,
    className: `${cell} ${messageOf(field) ? 'border-kiln' : 'border-ink-faint'}`,
  });
  const fields: Field[] = ['material', 'fit', 'offsetMm', 'measuredOn', 'source'];
  const messages = fields.filter((f) => messageOf(f));
  return (
    <div className="flex flex-wrap items-end gap-2">
      <select aria-label="Material" {...a11y('material')} {...register(`calibration.${index}.material`)}>
        {materialSchema.options.map((m) => (
          <option key={m}>{m}</option>
        ))}
      </select>
      <select aria-label="Fit" {...a11y('fit')} {...register(`calibration.${index}.fit`)}>
        {fitClassSchema.options.map((f) => (
          <option key={f}>{f}</option>
        ))}
      </select>
      <input
        aria-label="Offset, mm per side"
        {...a11y('offsetMm')}
        className={`${a11y('offsetMm').className} w-24`}
        type="number"
        step="0.01"
        {...register(`calibration.${index}.offsetMm`, num)}
      />
      <input
        aria-label="Measured on"
        {...a11y('measuredOn')}
        type="date"
        {...register(`calibration.${index}.measuredOn`)}
      />
      <input aria-label="Source" {...a11y('source')} {...register(`calibration.${index}.source`)} />
      <Button variant="quiet" onClick={onRemove}>
        Remove
      </Button>
      {messages.length > 0 && (
        <div role="alert" className="w-full text-sm font-medium text-kiln">
          {messages.map((f) => (
            <p key={f} id={`${id}-${f}-error`}>
              {messageOf(f)}
            </p>
          ))}
        </div>
      )}
    </div>
  );
}
