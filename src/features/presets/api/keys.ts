import type { PresetListQuery } from '../../../../shared/schemas/preset';

/** Query keys of the presets feature; mutations invalidate through the same keys. */
export const presetKeys = {
  all: (teamId: string) => ['teams', teamId, 'presets'] as const,
  list: (teamId: string, query: PresetListQuery) => ['teams', teamId, 'presets', 'list', query] as const,
  detail: (teamId: string, id: string) => ['teams', teamId, 'presets', 'detail', id] as const,
  versions: (teamId: string, id: string) => ['teams', teamId, 'presets', 'detail', id, 'versions'] as const,
};
