import { useWatch, type Control } from 'react-hook-form';
import type { DesignValues } from '../lib/design-values';
import type { LengthUnit } from '../lib/units';
import { ChoiceField } from './form/choice-field';
import { NumberField } from './form/number-field';
import { SelectField } from './form/select-field';

const shapes = [
  { value: 'square', label: 'Square' },
  { value: 'rect', label: 'Rectangular' },
  { value: 'round', label: 'Round' },
  { value: 'hex', label: 'Hexagonal' },
];

/** Registration keys: shape and size, how many, walls, and whether pockets grow or keys shrink. */
export function KeyFields({ control, unit }: { control: Control<DesignValues>; unit: LengthUnit }) {
  const shape = useWatch({ control, name: 'key.shape' });
  const strategy = useWatch({ control, name: 'key.strategy' });
  const widthLabel = shape === 'round' ? 'Key diameter' : shape === 'hex' ? 'Width across flats' : 'Key width (x)';
  return (
    <fieldset className="space-y-4">
      <legend className="text-lead font-bold">Keys</legend>
      <SelectField control={control} name="key.shape" label="Key shape" options={shapes} />
      <div className="grid grid-cols-2 gap-3">
        <NumberField control={control} name="key.width" label={widthLabel} unit={unit} />
        {shape === 'rect' && <NumberField control={control} name="key.length" label="Key length (y)" unit={unit} />}
        <NumberField control={control} name="key.depth" label="Depth into each half" unit={unit} />
        <NumberField control={control} name="key.count" label="How many" placeholder="as many as fit" />
        <NumberField control={control} name="key.margin" label="Wall around each pocket" unit={unit} />
      </div>
      <ChoiceField
        control={control}
        name="key.strategy"
        legend="Where does the clearance go?"
        columns={2}
        options={[
          {
            value: 'clearance',
            label: 'Grow the pockets',
            detail: 'Keys at full size, pockets larger by the clearance.',
          },
          { value: 'scale', label: 'Shrink the keys', detail: 'Pockets at full size, keys printed slightly smaller.' },
        ]}
      />
      {strategy === 'scale' && (
        <NumberField
          control={control}
          name="key.scale"
          label="Key scale"
          placeholder="from the clearance"
          hint="A fraction: 0.98 prints the keys at 98 %. Leave empty to work it out from the clearance."
        />
      )}
      <details className="rounded-md border border-paper-deep bg-white/60 px-3 py-2">
        <summary className="cursor-pointer font-medium">More key settings</summary>
        <div className="mt-3 grid grid-cols-2 gap-3">
          <NumberField
            control={control}
            name="key.chamfer"
            label="Key end chamfer"
            unit={unit}
            placeholder="automatic"
          />
          <NumberField
            control={control}
            name="key.endGap"
            label="End gap"
            unit={unit}
            placeholder="0.4 mm"
            hint="Key is shorter than both pockets by this."
          />
          <NumberField
            control={control}
            name="key.bottomGap"
            label="Pocket bottom gap"
            unit={unit}
            placeholder="half the end gap"
          />
          <NumberField
            control={control}
            name="key.entryChamfer"
            label="Pocket mouth chamfer"
            unit={unit}
            placeholder="none"
          />
          {shape === 'round' && (
            <NumberField
              control={control}
              name="key.flat"
              label="Flat on the key"
              unit={unit}
              placeholder="none"
              hint="Stops a round key turning; cut on one side."
            />
          )}
        </div>
      </details>
    </fieldset>
  );
}
