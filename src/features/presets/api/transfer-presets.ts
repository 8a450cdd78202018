import { useMutation, useQueryClient } from '@tanstack/react-query';
import { presetImportReportSchema, type PresetImportReport } from '../../../../shared/schemas/preset-transfer';
import { ApiError, apiFetch, apiFile, saveFile } from '../../../lib/api-client';
import { presetKeys } from './keys';

/** GET /api/teams/:teamId/presets/export, handed to the browser as a download. */
export async function exportPresets(teamId: string) {
  saveFile(await apiFile(`/teams/${teamId}/presets/export`));
}

/** POST /api/teams/:teamId/presets/import with the file; a refused import's 400 carries the report too. */
export async function importPresets(teamId: string, file: File): Promise<PresetImportReport> {
  const body = new FormData();
  body.set('file', file);
  try {
    return presetImportReportSchema.parse(await apiFetch(`/teams/${teamId}/presets/import`, { method: 'POST', body }));
  } catch (error) {
    const report = error instanceof ApiError ? presetImportReportSchema.safeParse(error.details.report) : null;
    if (report?.success) return report.data;
    throw error;
  }
}

export function useImportPresets(teamId: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (file: File) => importPresets(teamId, file),
    onSuccess: () => queryClient.invalidateQueries({ queryKey: presetKeys.all(teamId) }),
  });
}
