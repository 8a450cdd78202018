import type { Writable } from 'node:stream';
import { buildKit } from '../../../shared/kit/build-kit';
import type { ResolvedKitRequest } from '../../../shared/schemas/kit-request';
import { downloadName, withManifest, writeZip } from './kit-zip';

/** The download name of a kit: "seamwright-key-kit-3f9a1c2e.zip", the same for the same request. */
export function kitFileName(request: ResolvedKitRequest): string {
  return downloadName(`${request.joint}-kit`, request);
}

/**
 * Builds the kit; impossible geometry throws a GeometryError here, before any byte or header is sent.
 * The returned `writeTo` streams the zip.
 */
export function prepareKitZip(request: ResolvedKitRequest): {
  fileName: string;
  writeTo: (out: Writable) => Promise<void>;
} {
  const kit = buildKit(request);
  const entries = withManifest(kit.manifest, kit.files);
  return { fileName: kitFileName(request), writeTo: (out) => writeZip(entries, out) };
}

/** The manifest alone (POST /api/kits/summary): the same numbers as the zip's, without writing STL files. */
export { summarizeKit } from '../../../shared/kit/build-kit';
