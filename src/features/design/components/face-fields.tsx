import { useWatch, type Control } from 'react-hook-form';
import type { DesignValues } from '../lib/design-values';
import type { LengthUnit } from '../lib/units';
import { NumberField } from './form/number-field';
import { PointsField } from './form/points-field';
import { SelectField } from './form/select-field';

const shapes = [
  { value: 'rect', label: 'Rectangle' },
  { value: 'circle', label: 'Circle' },
  { value: 'polygon', label: 'Outline from points' },
];

/** The cut face: its shape and sizes, centred on the origin. */
export function FaceFields({ control, unit }: { control: Control<DesignValues>; unit: LengthUnit }) {
  const shape = useWatch({ control, name: 'face.shape' });
  return (
    <fieldset className="space-y-4">
      <legend className="text-lead font-bold">Cut face</legend>
      <p className="text-sm text-ink-soft">The flat face where you split the model, as seen from above half A.</p>
      <SelectField control={control} name="face.shape" label="Shape of the face" options={shapes} />
      {shape === 'rect' && (
        <div className="grid grid-cols-2 gap-3">
          <NumberField control={control} name="face.width" label="Face width (x)" unit={unit} />
          <NumberField control={control} name="face.height" label="Face height (y)" unit={unit} />
        </div>
      )}
      {shape === 'circle' && <NumberField control={control} name="face.diameter" label="Face diameter" unit={unit} />}
      {shape === 'polygon' && <PointsField control={control} unit={unit} />}
    </fieldset>
  );
}
