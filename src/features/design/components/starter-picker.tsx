import { useId, useState } from 'react';
import { Button } from '../../../components/ui/button';
import { STARTER_SETUPS, type StarterSetup } from '../lib/starter-setups';
import { inputClass } from './form/field-parts';

/**
 * Ready-made setups for common parts, for anyone (no account needed): choosing one fills the whole form, face
 * included, as a starting point to change.
 */
export function StarterPicker({ onPick }: { onPick: (setup: StarterSetup) => void }) {
  const selectId = useId();
  const hintId = useId();
  const [choice, setChoice] = useState('');
  const chosen = STARTER_SETUPS.find((s) => s.id === choice);
  return (
    <div className="space-y-1">
      <label htmlFor={selectId} className="block font-medium">
        Start from a ready-made setup
      </label>
      <div className="flex flex-wrap items-end gap-2">
        <select
          id={selectId}
          value={choice}
          onChange={(e) => setChoice(e.target.value)}
          aria-describedby={hintId}
          className={`${inputClass(false)} min-w-0 flex-1 basis-48`}
        >
          <option value="">Choose a setup…</option>
          {STARTER_SETUPS.map((s) => (
            <option key={s.id} value={s.id}>
              {s.name}
            </option>
          ))}
        </select>
        <Button variant="quiet" disabled={!chosen} onClick={() => chosen && onPick(chosen)}>
          Use this setup
        </Button>
      </div>
      <p id={hintId} className="text-sm text-ink-soft">
        {chosen
          ? chosen.detail
          : 'Typical joints for figures, helmets, bases and small resin parts; change anything after.'}
      </p>
    </div>
  );
}
