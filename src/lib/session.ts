import { queryOptions, useQuery } from '@tanstack/react-query';
import { useCallback, useSyncExternalStore } from 'react';
import { sessionReplySchema, type Me } from '../../shared/schemas/account';
import type { TeamSummary } from '../../shared/schemas/team';
import { apiFetch } from './api-client';

/**
 * Who is signed in, or null when nobody is. Asks GET /api/session, which answers 200 either way: a 401 from
 * /api/me would show as a failed request in a visitor's console on every page.
 */
export async function getMe(): Promise<Me | null> {
  return sessionReplySchema.parse(await apiFetch('/session')).me;
}

export const meQueryKey = ['me'] as const;
export const meQueryOptions = () => queryOptions({ queryKey: meQueryKey, queryFn: getMe });

/** The signed-in user and their teams (null when signed out); shared by every page. */
export function useMe() {
  return useQuery(meQueryOptions());
}

// The chosen team is remembered per browser; the server checks membership on every request.
const STORAGE_KEY = 'seamwright.currentTeam';
const listeners = new Set<() => void>();
const subscribe = (listener: () => void) => {
  listeners.add(listener);
  return () => listeners.delete(listener);
};
const read = () => window.localStorage.getItem(STORAGE_KEY);

/** The team the user works in now (the first team when none was chosen or the choice is gone), and a switcher. */
export function useCurrentTeam(): { team: TeamSummary | null; teams: TeamSummary[]; switchTo: (id: string) => void } {
  const { data } = useMe();
  const storedId = useSyncExternalStore(subscribe, read, () => null);
  const teams = data?.teams ?? [];
  const team = teams.find((t) => t.id === storedId) ?? teams[0] ?? null;
  const switchTo = useCallback((id: string) => {
    window.localStorage.setItem(STORAGE_KEY, id);
    listeners.forEach((l) => l());
  }, []);
  return { team, teams, switchTo };
}
