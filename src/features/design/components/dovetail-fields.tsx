import type { Control } from 'react-hook-form';
import type { DesignValues } from '../lib/design-values';
import type { LengthUnit } from '../lib/units';
import { NumberField } from './form/number-field';
import { useController } from 'react-hook-form';

function EndStopToggle({ control }: { control: Control<DesignValues> }) {
  const { field } = useController({ control, name: 'dovetail.endStop' });
  return (
    <label className="flex items-start gap-2">
      <input
        type="checkbox"
        name={field.name}
        ref={field.ref}
        checked={Boolean(field.value)}
        onChange={(e) => field.onChange(e.target.checked)}
        onBlur={field.onBlur}
        className="mt-1.5 size-4 accent-kiln"
      />
      <span>
        <span className="block font-medium">Close one end of each slot</span>
        <span className="block text-sm text-ink-soft">
          Half B then slides on from one side only and stops in place.
        </span>
      </span>
    </label>
  );
}

/** Sliding dovetail rails: section, slope, how many and how far apart, and an optional end stop. */
export function DovetailFields({ control, unit }: { control: Control<DesignValues>; unit: LengthUnit }) {
  return (
    <fieldset className="space-y-4">
      <legend className="text-lead font-bold">Dovetail rails</legend>
      <p className="text-sm text-ink-soft">Rails stand on half A and run along y; half B has the matching slots.</p>
      <div className="grid grid-cols-2 gap-3">
        <NumberField control={control} name="dovetail.rootWidth" label="Width at the face" unit={unit} />
        <NumberField control={control} name="dovetail.height" label="Rail height" unit={unit} />
        <NumberField
          control={control}
          name="dovetail.slope"
          label="Slope (1 in n)"
          suffix="1:n"
          hint="6 for a gentle flare, 8 for a slimmer one."
        />
        <NumberField control={control} name="dovetail.count" label="How many rails" />
        <NumberField control={control} name="dovetail.pitch" label="Spacing" unit={unit} placeholder="spread evenly" />
        <NumberField
          control={control}
          name="dovetail.length"
          label="Rail length"
          unit={unit}
          placeholder="as long as fits"
        />
        <NumberField control={control} name="dovetail.margin" label="Wall beside each slot" unit={unit} />
        <NumberField
          control={control}
          name="dovetail.chamfer"
          label="Rail end chamfer"
          unit={unit}
          placeholder="automatic"
        />
      </div>
      <EndStopToggle control={control} />
      <NumberField control={control} name="dovetail.endStopWall" label="End stop wall" unit={unit} placeholder="3 mm" />
    </fieldset>
  );
}
