import type { Geometry } from '../../geometry/geometry';
import type { ResolvedKitRequest } from '../../../shared/schemas/kit-request';
import { downloadName } from './kit-zip';

/** The download name of a kit: "seamwright-key-kit-3f9a1c2e.zip", the same for the same request. */
export function kitFileName(request: ResolvedKitRequest): string {
  return downloadName(`${request.joint}-kit`, request);
}

/**
 * Builds the kit's zip on a geometry thread; impossible geometry or a request over the work budget rejects
 * with a GeometryError before any byte or header is sent.
 */
export async function buildKitDownload(
  geometry: Geometry,
  request: ResolvedKitRequest,
): Promise<{ fileName: string; zip: Uint8Array }> {
  const { zip } = await geometry.kitZip(request);
  return { fileName: kitFileName(request), zip };
}
