import { Link } from 'react-router-dom';
import { useWatch, type Control, type UseFormSetValue } from 'react-hook-form';
import { defaultProcessFor } from '../../../../shared/fit/default-process-for';
import { materialSchema, type Material } from '../../../../shared/schemas/joint-options';
import type { DesignValues } from '../lib/design-values';
import type { TeamChoices } from '../lib/preset-values';
import type { LengthUnit } from '../lib/units';
import { ChoiceField } from './form/choice-field';
import { NumberField } from './form/number-field';
import { PrinterField } from './printer-field';
import { SelectField } from './form/select-field';

const materialNames: Record<Material, string> = {
  PLA: 'PLA',
  PETG: 'PETG',
  ABS: 'ABS',
  ASA: 'ASA',
  PA: 'PA (nylon)',
  TPU: 'TPU (flexible)',
  'resin-standard': 'Standard resin',
  'resin-tough': 'Tough resin',
};

const fits = [
  { value: 'press', label: 'Press', detail: 'Pushed in with force; stays put without glue.' },
  { value: 'snug', label: 'Snug', detail: 'Lines up exactly; glued.' },
  { value: 'slide', label: 'Slide', detail: 'Comes apart by hand.' },
];

interface FitFieldsProps {
  control: Control<DesignValues>;
  setValue: UseFormSetValue<DesignValues>;
  unit: LengthUnit;
  /** The current team's printer profiles and materials; null when nobody is signed in. */
  team: TeamChoices | null;
}

/** Printing process, material, fit class and clearance (derived by the fit engine, or the maker's own). */
export function FitFields({ control, setValue, unit, team }: FitFieldsProps) {
  const [process, material, clearanceMode, printerProfileId] = useWatch({
    control,
    name: ['process', 'material', 'clearanceMode', 'printerProfileId'],
  });
  // A team material or a preset's saved tuning belongs to one base material; it means nothing for another.
  const forgetTuning = () => {
    setValue('teamMaterialId', '', { shouldValidate: true });
    setValue('materialTuning', undefined, { shouldValidate: true });
  };
  const variants = team?.teamMaterials.filter((m) => m.baseMaterial === material) ?? [];
  const materials = materialSchema.options
    .filter((m) => defaultProcessFor(m) === process)
    .map((m) => ({ value: m, label: materialNames[m] }));
  return (
    <fieldset className="space-y-4">
      <legend className="text-lead font-bold">Material and fit</legend>
      <div className="grid gap-3 sm:grid-cols-2">
        <SelectField
          control={control}
          name="process"
          label="Printing process"
          options={[
            { value: 'fdm', label: 'Filament (FDM)' },
            { value: 'resin', label: 'Resin' },
          ]}
          onPicked={(p) => {
            setValue('material', p === 'resin' ? 'resin-standard' : 'PLA', { shouldValidate: true });
            forgetTuning();
            // A profile prints one process; its calibration means nothing for the other.
            setValue('printerProfileId', '', { shouldValidate: true });
          }}
        />
        <SelectField control={control} name="material" label="Material" options={materials} onPicked={forgetTuning} />
      </div>
      {team && (
        <SelectField
          control={control}
          name="teamMaterialId"
          label="Team material"
          hint={`Your team’s own ${materialNames[material]}, with its clearance adjustments.`}
          options={[
            {
              value: '',
              label: variants.length
                ? `None: the catalogue’s ${materialNames[material]}`
                : 'None saved for this material',
            },
            ...variants.map((m) => ({ value: m.id, label: m.name })),
          ]}
        />
      )}
      <ChoiceField control={control} name="fit" legend="How should the joint hold?" options={fits} />
      <ChoiceField
        control={control}
        name="clearanceMode"
        legend="Clearance per side"
        columns={2}
        options={[
          { value: 'derived', label: 'Work it out for me', detail: 'From the material, fit and printer correction.' },
          { value: 'set', label: 'I know my number', detail: 'Use my own gap per side.' },
        ]}
      />
      {clearanceMode === 'set' && (
        <NumberField
          control={control}
          name="clearance"
          label="Clearance per side"
          unit={unit}
          hint="Gap between key and pocket wall on each side."
        />
      )}
      {team && (
        <PrinterField
          control={control}
          profiles={team.printerProfiles}
          teamMaterials={team.teamMaterials}
          unit={unit}
        />
      )}
      {!printerProfileId && (
        <NumberField
          control={control}
          name="calibrationOffset"
          label="Printer correction (optional)"
          unit={unit}
          placeholder="none"
          hint="From your printer’s fit test: positive if test keys came out tight, negative if loose."
        />
      )}
      {!team && (
        <p className="text-sm text-ink-soft">
          <Link to="/sign-in" className="font-medium text-ink underline underline-offset-4">
            Sign in
          </Link>{' '}
          to keep printer profiles with your fit-test numbers.
        </p>
      )}
    </fieldset>
  );
}
