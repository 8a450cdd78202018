import { useMutation } from '@tanstack/react-query';
import type { KitRequest } from '../../../../shared/schemas/kit-request';
import { ApiError } from '../../../lib/api-client';

/** A downloaded file: its bytes and the name the server gave it. */
export interface DownloadedFile {
  readonly blob: Blob;
  readonly name: string;
}

/** POST /api/kits: the kit as a zip (STL files, manifest.json, README.txt). No sign-in needed. */
export async function downloadKit(request: KitRequest): Promise<DownloadedFile> {
  let response: Response;
  try {
    response = await fetch('/api/kits', {
      method: 'POST',
      headers: { 'Content-Type': 'application/json' },
      body: JSON.stringify(request),
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
  return { blob: await response.blob(), name };
}

/** The zip download as a mutation: pending while the server builds, the error in the server's words. */
export function useDownloadKit() {
  return useMutation({ mutationFn: downloadKit });
}
