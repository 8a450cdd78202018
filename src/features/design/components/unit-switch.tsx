import type { LengthUnit } from '../lib/units';

/** Millimetres or inches for every length on the screen; values are kept in mm, so nothing drifts. */
export function UnitSwitch({ unit, onChange }: { unit: LengthUnit; onChange: (u: LengthUnit) => void }) {
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
