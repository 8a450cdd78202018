import { createHash } from 'node:crypto';
import type { Writable } from 'node:stream';
import { buildKit, summarizeKit as summarizeKitManifest } from '../../../shared/kit/build-kit';
import type { ResolvedKitRequest } from '../../../shared/schemas/kit-request';
import { writeZip, type ZipEntry } from './kit-zip';

type Kit = ReturnType<typeof buildKit>;

/** The kit's files as zip entries: the STLs and README.txt from the builder, plus manifest.json. */
function kitEntries(kit: Kit): ZipEntry[] {
  const manifest = new TextEncoder().encode(`${JSON.stringify(kit.manifest, null, 2)}\n`);
  return [{ name: 'manifest.json', bytes: manifest }, ...kit.files];
}

/**
 * A download name that says what is inside and changes with the request: "seamwright-key-kit-3f9a1c2e.zip".
 * The hash is of the resolved request, so the same request always downloads under the same name.
 */
export function kitFileName(request: ResolvedKitRequest): string {
  const digest = createHash('sha256').update(JSON.stringify(request)).digest('hex').slice(0, 8);
  return `seamwright-${request.joint}-kit-${digest}.zip`;
}

/**
 * Builds the kit; impossible geometry throws a GeometryError here, before any byte or header is sent.
 * The returned `writeTo` streams the zip.
 */
export function prepareKitZip(request: ResolvedKitRequest): {
  fileName: string;
  writeTo: (out: Writable) => Promise<void>;
} {
  const entries = kitEntries(buildKit(request));
  return { fileName: kitFileName(request), writeTo: (out) => writeZip(entries, out) };
}

/** The manifest alone: what a kit would contain, without writing STL files. */
export function summarizeKit(request: ResolvedKitRequest): Kit['manifest'] {
  return summarizeKitManifest(request);
}
