import { queryOptions, useQuery } from '@tanstack/react-query';
import { useCallback, useSyncExternalStore } from 'react';
import { meSchema, type Me } from '../../shared/schemas/account';
import type { TeamSummary } from '../../shared/schemas/team';
import { ApiError, apiFetch } from './api-client';

/** Who is signed in: the reply of GET /api/me, or null when nobody is (401). */
export async function getMe(): Promise<Me | null> {
  try {
    return meSchema.parse(await apiFetch('/me'));
  } catch (error) {
    if (error instanceof ApiError && error.status === 401) return null;
    throw error;
  }
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
