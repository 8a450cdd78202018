import { memo } from 'react';
import { useWatch, type UseFormReturn } from 'react-hook-form';
import type { DesignValues } from '../lib/design-values';
import type { TeamChoices } from '../lib/preset-values';
import type { LengthUnit } from '../lib/units';
import { DovetailFields } from './dovetail-fields';
import { FaceFields } from './face-fields';
import { FitFields } from './fit-fields';
import { ChoiceField } from './form/choice-field';
import { KeyFields } from './key-fields';

interface DesignFormProps {
  form: UseFormReturn<DesignValues>;
  unit: LengthUnit;
  /** The current team's printer profiles and materials; null when nobody is signed in. */
  team: TeamChoices | null;
}

/** Every setting of a kit. The preview follows each change, so the form has no submit button. */
export const DesignForm = memo(function DesignForm({ form, unit, team }: DesignFormProps) {
  const { control, setValue } = form;
  const joint = useWatch({ control, name: 'joint' });
  return (
    <form aria-label="Joint settings" noValidate onSubmit={(e) => e.preventDefault()} className="space-y-8">
      <ChoiceField
        control={control}
        name="joint"
        legend="Joint"
        columns={2}
        options={[
          { value: 'key', label: 'Registration keys', detail: 'Loose keys in matching pockets on both halves.' },
          { value: 'dovetail', label: 'Sliding dovetail', detail: 'Rails on one half slide into slots on the other.' },
        ]}
      />
      <FaceFields control={control} unit={unit} />
      {joint === 'key' ? <KeyFields control={control} unit={unit} /> : <DovetailFields control={control} unit={unit} />}
      <FitFields control={control} setValue={setValue} unit={unit} team={team} />
    </form>
  );
});
