import { zodResolver } from '@hookform/resolvers/zod';
import { useEffect, useRef } from 'react';
import { useFieldArray, useForm, type Resolver } from 'react-hook-form';
import { printerProfileInputSchema, type PrinterProfileInput } from '../../../../shared/schemas/printer-profile';
import { Button } from '../../../components/ui/button';
import { Notice } from '../../../components/ui/notice';
import { TextField } from '../../../components/ui/text-field';
import { showApiError } from '../../../lib/form-errors';
import { CalibrationRow } from './calibration-row';

const cell = 'rounded-md border border-ink-faint bg-white px-2 py-1';
const num = { setValueAs: (v: unknown) => (v === '' || v === null ? null : Number(v)) };
const calibrationFields = ['material', 'fit', 'offsetMm', 'measuredOn', 'source'] as const;
const today = () => new Date().toISOString().slice(0, 10);

/** A printer profile: process, build volume, nozzle, layer height, notes and its calibration table. */
export function PrinterProfileForm({
  initial,
  onSubmit,
}: {
  initial: PrinterProfileInput;
  onSubmit: (v: PrinterProfileInput) => Promise<unknown>;
}) {
  const form = useForm<PrinterProfileInput>({
    resolver: zodResolver(printerProfileInputSchema) as unknown as Resolver<PrinterProfileInput>,
    defaultValues: initial,
  });
  const { register, handleSubmit, setError, control, formState, watch } = form;
  const rows = useFieldArray({ control, name: 'calibration' });
  const { errors, isSubmitting } = formState;
  const isFdm = watch('process') === 'fdm';
  // A resin printer has no nozzle: the hidden field must not keep the FDM value (the schema refuses it, and
  // its message would have no field to sit beside). Switching back brings the last nozzle typed.
  const lastNozzle = useRef(initial.nozzleDiameter ?? 0.4);
  useEffect(() => {
    const nozzle = form.getValues('nozzleDiameter');
    if (!isFdm && nozzle !== null && nozzle !== undefined) {
      lastNozzle.current = nozzle;
      form.setValue('nozzleDiameter', null);
    } else if (isFdm && (nozzle === null || nozzle === undefined)) {
      form.setValue('nozzleDiameter', lastNozzle.current);
    }
  }, [isFdm, form]);
  const submit = handleSubmit(async (values) => {
    try {
      await onSubmit(values);
    } catch (error) {
      // The server's message lands beside its field; a calibration entry's too.
      const entryFields = (form.getValues('calibration') ?? []).flatMap((_, i) =>
        calibrationFields.map((f) => `calibration.${i}.${f}` as const),
      );
      showApiError(error, setError, ['name', 'nozzleDiameter', 'layerHeight', ...entryFields]);
    }
  });
  return (
    <form onSubmit={submit} noValidate className="space-y-4">
      {errors.root?.message && <Notice tone="error">{errors.root.message}</Notice>}
      <TextField label="Name" registration={register('name')} error={errors.name} />
      <label className="flex flex-col gap-1">
        <span className="font-medium">Process</span>
        <select className={cell} {...register('process')}>
          <option value="fdm">FDM (filament)</option>
          <option value="resin">Resin</option>
        </select>
      </label>
      <fieldset className="grid gap-3 sm:grid-cols-3">
        <legend className="font-medium">Build volume, mm</legend>
        {(['x', 'y', 'z'] as const).map((axis) => (
          <TextField
            key={axis}
            label={axis}
            type="number"
            step="any"
            registration={register(`buildVolume.${axis}`, num)}
            error={errors.buildVolume?.[axis]}
          />
        ))}
      </fieldset>
      {isFdm && (
        <TextField
          label="Nozzle diameter, mm"
          type="number"
          step="any"
          registration={register('nozzleDiameter', num)}
          error={errors.nozzleDiameter}
        />
      )}
      <TextField
        label="Layer height, mm"
        type="number"
        step="any"
        registration={register('layerHeight', num)}
        error={errors.layerHeight}
      />
      <label className="flex flex-col gap-1">
        <span className="font-medium">Notes</span>
        <textarea className={cell} rows={2} {...register('notes')} />
      </label>
      <fieldset className="space-y-2">
        <legend className="font-medium">
          Calibration: the clearance offset this printer needs, per material and fit
        </legend>
        {rows.fields.length === 0 && (
          <p className="text-sm text-ink-soft">No entries: the fit engine uses the published defaults.</p>
        )}
        {rows.fields.map((field, i) => (
          <CalibrationRow
            key={field.id}
            index={i}
            register={register}
            errors={errors.calibration?.[i]}
            onRemove={() => rows.remove(i)}
          />
        ))}
        {(errors.calibration?.message ?? errors.calibration?.root?.message) && (
          <p role="alert" className="text-sm font-medium text-kiln">
            {errors.calibration?.message ?? errors.calibration?.root?.message}
          </p>
        )}
        <Button
          variant="quiet"
          onClick={() =>
            rows.append({
              material: isFdm ? 'PLA' : 'resin-standard',
              fit: 'snug',
              offsetMm: 0,
              measuredOn: today(),
              source: 'entered by hand',
            })
          }
        >
          Add a calibration entry
        </Button>
      </fieldset>
      <Button type="submit" disabled={isSubmitting}>
        Save printer profile
      </Button>
    </form>
  );
}
