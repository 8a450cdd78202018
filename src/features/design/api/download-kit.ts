import { useMutation } from '@tanstack/react-query';
import type { KitRequest } from '../../../../shared/schemas/kit-request';
import { ApiError } from '../../../lib/api-client';
import { useCurrentTeam } from '../../../lib/session';

/** A downloaded file: its bytes and the name the server gave it. */
export interface DownloadedFile {
  readonly blob: Blob;
  readonly name: string;
  /** The clearance per side the server built a recorded kit with (mm); absent for the public route. */
  readonly clearancePerSide?: number;
}

/** What a recorded download names besides its request: the preset (and version), printer and team material. */
export interface KitOrigin {
  readonly presetId?: string | null;
  readonly presetVersion?: number | null;
  readonly printerProfileId?: string | null;
  readonly teamMaterialId?: string | null;
}

/**
 * The kit as a zip (STL files, manifest.json, README.txt). Signed out: POST /api/kits (no account needed).
 * Signed in with a current team: POST /api/teams/:teamId/kits, which builds the same zip and records it in
 * the team's kit history (who, when, the full request, the preset and printer profile it came from), so it
 * can be downloaded again later.
 */
export async function downloadKit({
  request,
  teamId,
  origin = {},
}: {
  request: KitRequest;
  teamId?: string;
  origin?: KitOrigin;
}): Promise<DownloadedFile> {
  const [url, body] = teamId ? [`/api/teams/${teamId}/kits`, { request, ...origin }] : ['/api/kits', request];
  let response: Response;
  try {
    response = await fetch(url, {
      method: 'POST',
      headers: { 'Content-Type': 'application/json' },
      body: JSON.stringify(body),
      credentials: 'same-origin',
    });
  } catch {
    throw new ApiError(0, 'NETWORK', 'Seamwright could not reach its server. Check that it is running.');
  }
  if (!response.ok) {
    const body = (await response.json().catch(() => ({}))) as { error?: { code?: string; message?: string } };
    throw new ApiError(
      response.status,
      body.error?.code ?? 'INTERNAL',
      body.error?.message ?? `The server answered ${response.status}.`,
    );
  }
  const disposition = response.headers.get('Content-Disposition') ?? '';
  const name = /filename="?([^";]+)"?/.exec(disposition)?.[1] ?? 'seamwright-kit.zip';
  const clearance = Number(response.headers.get('X-Seamwright-Clearance') ?? Number.NaN);
  return {
    blob: await response.blob(),
    name,
    ...(Number.isFinite(clearance) ? { clearancePerSide: clearance } : {}),
  };
}

/** The zip download as a mutation: pending while the server builds, the error in the server's words. */
export function useDownloadKit() {
  const { team } = useCurrentTeam();
  return useMutation({
    mutationFn: ({ request, origin }: { request: KitRequest; origin?: KitOrigin }) =>
      downloadKit({ request, teamId: team?.id, origin }),
  });
}
