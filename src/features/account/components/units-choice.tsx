import { useId } from 'react';
import type { Units } from '../../../../shared/schemas/account';
import { useSaveUnits } from '../../../lib/units-preference';
import { useAccount } from '../api/get-account';

const choices: Array<{ value: Units; label: string; hint: string }> = [
  { value: 'mm', label: 'Millimetres', hint: '80 mm' },
  { value: 'in', label: 'Inches', hint: '3.1496 in' },
];

/**
 * Millimetres or inches for every length you see and type, on every device you sign in on. Sizes are
 * kept in millimetres either way, so switching back and forth never changes a design.
 */
export function UnitsChoice() {
  const { data: account } = useAccount();
  const save = useSaveUnits();
  const hintId = useId();
  const current = account?.units ?? 'mm';
  return (
    <div className="space-y-3">
      <fieldset className="space-y-2" aria-describedby={hintId}>
        <legend className="font-medium">Show and type lengths in</legend>
        <p id={hintId} className="text-sm text-ink-soft">
          Used on the design screen wherever you sign in. Sizes are kept in millimetres, so switching never changes a
          design.
        </p>
        <div className="flex flex-wrap gap-3">
          {choices.map((c) => (
            <label
              key={c.value}
              className={`flex cursor-pointer items-center gap-2 rounded-md border px-3 py-2 has-[:focus-visible]:outline-3 has-[:focus-visible]:outline-offset-2 has-[:focus-visible]:outline-kiln ${current === c.value ? 'border-ink bg-paper-deep' : 'border-ink-faint bg-white'}`}
            >
              <input
                type="radio"
                name="account-units"
                value={c.value}
                checked={current === c.value}
                onChange={() => save.mutate(c.value)}
                // The label draws the focus ring around the whole choice.
                className="accent-ink focus-visible:outline-none"
              />
              <span className="font-medium">{c.label}</span>
              <span aria-hidden="true" className="text-sm text-ink-soft">
                e.g. {c.hint}
              </span>
            </label>
          ))}
        </div>
      </fieldset>
      <p role="status" className="min-h-6 text-sm text-ink-soft">
        {save.isPending ? 'Saving…' : save.isSuccess ? 'Saved.' : ''}
      </p>
      {save.isError && (
        <p role="alert" className="text-kiln">
          Your units were not saved: {save.error.message}
        </p>
      )}
    </div>
  );
}
