import { useId } from 'react';
import { useWatch, type UseFormReturn } from 'react-hook-form';
import type { Material } from '../../../../shared/schemas/joint-options';
import { TextField } from '../../../components/ui/text-field';
import type { CouponForm } from '../lib/coupon-form';

const cell = 'rounded-md border border-ink-faint bg-white px-2 py-1';
const num = { valueAsNumber: true } as const;

/** The coupon's settings: joint, material, the key's or the dovetail's size, and the clearance range to test. */
export function CouponSettings({ form, materials }: { form: UseFormReturn<CouponForm>; materials: Material[] }) {
  const id = useId();
  const { register, control, formState } = form;
  const { errors } = formState;
  const joint = useWatch({ control, name: 'joint' });
  return (
    <>
      <div className="grid gap-3 sm:grid-cols-4">
        <div className="flex flex-col gap-1">
          <label htmlFor={`${id}-joint`} className="font-medium">
            Joint to test
          </label>
          <select id={`${id}-joint`} className={cell} {...register('joint')}>
            <option value="key">Keys in pockets</option>
            <option value="dovetail">Dovetail rail in slots</option>
          </select>
        </div>
        <div className="flex flex-col gap-1">
          <label htmlFor={`${id}-material`} className="font-medium">
            Material
          </label>
          <select id={`${id}-material`} className={cell} {...register('material')}>
            {materials.map((m) => (
              <option key={m}>{m}</option>
            ))}
          </select>
        </div>
      </div>
      {joint === 'dovetail' ? (
        <div className="grid gap-3 sm:grid-cols-3">
          <TextField
            label="Rail root width, mm"
            hint="Across the rail where it meets the face."
            type="number"
            step="any"
            registration={register('dovetail.rootWidth', num)}
            error={errors.dovetail?.rootWidth}
          />
          <TextField
            label="Rail height, mm"
            type="number"
            step="any"
            registration={register('dovetail.height', num)}
            error={errors.dovetail?.height}
          />
          <TextField
            label="Slope, the n of 1:n"
            hint="6 (1:6) is the usual slope; 8 is shallower."
            type="number"
            step="any"
            registration={register('dovetail.slope', num)}
            error={errors.dovetail?.slope}
          />
        </div>
      ) : (
        <div className="grid gap-3 sm:grid-cols-3">
          <div className="flex flex-col gap-1">
            <label htmlFor={`${id}-shape`} className="font-medium">
              Key shape
            </label>
            <select id={`${id}-shape`} className={cell} {...register('key.shape')}>
              <option value="square">Square</option>
              <option value="round">Round</option>
              <option value="hex">Hexagon</option>
            </select>
          </div>
          <TextField
            label="Key width, mm"
            type="number"
            step="any"
            registration={register('key.width', num)}
            error={errors.key?.width}
          />
          <TextField
            label="Key depth, mm"
            type="number"
            step="any"
            registration={register('key.depth', num)}
            error={errors.key?.depth}
          />
        </div>
      )}
      <fieldset className="grid gap-3 sm:grid-cols-3">
        <legend className="font-medium">Clearance per side to test</legend>
        <TextField
          label="From, mm"
          type="number"
          step="any"
          registration={register('clearanceFrom', num)}
          error={errors.clearanceFrom}
        />
        <TextField
          label="To, mm"
          type="number"
          step="any"
          registration={register('clearanceTo', num)}
          error={errors.clearanceTo}
        />
        <TextField
          label="Step, mm"
          type="number"
          step="any"
          registration={register('clearanceStep', num)}
          error={errors.clearanceStep}
        />
      </fieldset>
    </>
  );
}
