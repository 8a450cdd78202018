import { useCallback, useEffect, useSyncExternalStore } from 'react';
import { useMe } from '../../../lib/session';
import { useUnitsPreference } from '../../../lib/units-preference';
import type { LengthUnit } from '../lib/units';

const listeners = new Set<() => void>();
const subscribe = (listener: () => void) => {
  listeners.add(listener);
  return () => listeners.delete(listener);
};

// The choice of people who are not signed in, on this browser (the key earlier versions used for guests).
const GUEST_KEY = 'seamwright.units.guest';
const readGuest = () => window.localStorage.getItem(GUEST_KEY);

/**
 * Millimetres or inches for display and entry. Signed in, it is the account's choice (saved on the
 * server, so every browser agrees; the screen follows a change at once). Signed out, it is remembered
 * on this browser.
 */
export function useUnits(): { unit: LengthUnit; setUnit: (unit: LengthUnit) => void; saveError: string | null } {
  const { data: me } = useMe();
  const signedIn = Boolean(me);
  const account = useUnitsPreference(signedIn);
  const guest = useSyncExternalStore(subscribe, readGuest, () => null);
  const { save } = account;
  // Earlier versions kept a signed-in person's choice on the browser only (seamwright.units.<userId>): carry
  // it into the account once, so nobody who chose inches finds millimetres after the update.
  const userId = me?.user.id ?? null;
  const loaded = account.units !== undefined;
  useEffect(() => {
    if (!userId || !loaded) return;
    const key = `seamwright.units.${userId}`;
    const old = window.localStorage.getItem(key);
    if (old === null) return;
    window.localStorage.removeItem(key);
    if (old === 'in' && account.units === 'mm') save('in');
  }, [userId, loaded, account.units, save]);
  const setUnit = useCallback(
    (unit: LengthUnit) => {
      if (signedIn) return save(unit);
      window.localStorage.setItem(GUEST_KEY, unit);
      listeners.forEach((l) => l());
    },
    [signedIn, save],
  );
  // Until the account has loaded, millimetres: the stored default of every account.
  const chosen = signedIn ? account.units : guest;
  return { unit: chosen === 'in' ? 'in' : 'mm', setUnit, saveError: signedIn ? account.saveError : null };
}
