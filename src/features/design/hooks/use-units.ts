import { useCallback, useSyncExternalStore } from 'react';
import { useMe } from '../../../lib/session';
import type { LengthUnit } from '../lib/units';

const listeners = new Set<() => void>();
const subscribe = (listener: () => void) => {
  listeners.add(listener);
  return () => listeners.delete(listener);
};

/** The storage key of one person's unit choice; people who are not signed in share one on this browser. */
export const unitsStorageKey = (userId: string | null) => `seamwright.units.${userId ?? 'guest'}`;

/** Millimetres or inches for display and entry, remembered on this browser for each signed-in user. */
export function useUnits(): { unit: LengthUnit; setUnit: (unit: LengthUnit) => void } {
  const { data: me } = useMe();
  const key = unitsStorageKey(me?.user.id ?? null);
  const stored = useSyncExternalStore(
    subscribe,
    () => window.localStorage.getItem(key),
    () => null,
  );
  const setUnit = useCallback(
    (unit: LengthUnit) => {
      window.localStorage.setItem(key, unit);
      listeners.forEach((l) => l());
    },
    [key],
  );
  return { unit: stored === 'in' ? 'in' : 'mm', setUnit };
}
