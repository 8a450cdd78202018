import { useQuery } from '@tanstack/react-query';
import { useMemo } from 'react';
import { DesignScreen } from '../../features/design/components/design-screen';
import type { DesignLibrary } from '../../features/design/lib/design-library';
import { createPreset } from '../../features/presets/api/create-preset';
import { getPreset } from '../../features/presets/api/get-preset';
import { teamMaterialsQueryOptions } from '../../features/materials/api/materials';
import { presetsQueryOptions } from '../../features/presets/api/get-presets';
import { conflictOf, updatePreset } from '../../features/presets/api/update-preset';
import { printerProfilesQueryOptions } from '../../features/printer-profiles/api/printer-profiles';
import { useCurrentTeam } from '../../lib/session';

/**
 * /design: the joint designer. Loaded lazily, so three.js and the geometry code load only here. Signed in,
 * the screen gets the current team's presets, printer profiles and materials from their features.
 */
export function DesignRoute() {
  const { team } = useCurrentTeam();
  const teamId = team?.id ?? '';
  const enabled = Boolean(team);
  const list = { sort: 'name', order: 'asc', pageSize: 100 } as const;
  const presets = useQuery({ ...presetsQueryOptions(teamId, list), enabled });
  const profiles = useQuery({ ...printerProfilesQueryOptions(teamId, list), enabled });
  const materials = useQuery({ ...teamMaterialsQueryOptions(teamId, list), enabled });
  const { refetch } = presets;
  const library = useMemo<DesignLibrary | null>(() => {
    if (!team) return null;
    return {
      teamId: team.id,
      teamName: team.name,
      ready: presets.isSuccess && profiles.isSuccess && materials.isSuccess,
      canEdit: team.role !== 'viewer',
      presets: presets.data?.items.map(({ id, name, version }) => ({ id, name, version })) ?? [],
      printerProfiles: profiles.data?.items ?? [],
      teamMaterials: materials.data?.items ?? [],
      loadPreset: (id) => getPreset(team.id, id),
      createPreset: async (body) => {
        const saved = await createPreset(team.id, body);
        void refetch();
        return saved;
      },
      updatePreset: async (id, patch) => {
        try {
          const saved = await updatePreset(team.id, id, patch);
          void refetch();
          return { saved };
        } catch (error) {
          const current = conflictOf(error);
          if (current) return { conflict: current };
          throw error;
        }
      },
    };
  }, [
    team,
    presets.data,
    profiles.data,
    materials.data,
    presets.isSuccess,
    profiles.isSuccess,
    materials.isSuccess,
    refetch,
  ]);
  return <DesignScreen library={library} />;
}
