import type { LengthUnit } from '../lib/units';

/** Millimetres or inches for every length on the screen; values are kept in mm, so nothing drifts. */
export function UnitSwitch({
  unit,
  onChange,
  saveError = null,
}: {
  unit: LengthUnit;
  onChange: (u: LengthUnit) => void;
  /** The account did not keep the last choice: it went back, say why. */
  saveError?: string | null;
}) {
  return (
    <div className="space-y-1">
      <UnitChoices unit={unit} onChange={onChange} />
      {saveError && (
        <p role="alert" className="max-w-xs text-sm font-medium text-kiln">
          Your choice of units was not saved: {saveError}
        </p>
      )}
    </div>
  );
}

function UnitChoices({ unit, onChange }: { unit: LengthUnit; onChange: (u: LengthUnit) => void }) {
  return (
    <fieldset className="flex items-center gap-2">
      <legend className="sr-only">Units</legend>
      <span aria-hidden="true" className="text-ink-soft">
        Units
      </span>
      {(['mm', 'in'] as const).map((u) => (
        <label
          key={u}
          className={`cursor-pointer rounded-md border px-3 py-1.5 font-medium has-[:focus-visible]:outline-3 has-[:focus-visible]:outline-offset-2 has-[:focus-visible]:outline-kiln ${unit === u ? 'border-ink bg-ink text-paper' : 'border-ink-faint bg-white text-ink'}`}
        >
          <input
            type="radio"
            name="units"
            value={u}
            checked={unit === u}
            onChange={() => onChange(u)}
            className="sr-only"
          />
          {u === 'mm' ? 'Millimetres' : 'Inches'}
        </label>
      ))}
    </fieldset>
  );
}
