import { createHash } from 'node:crypto';
import { ZipArchive } from 'archiver';
import type { Writable } from 'node:stream';

export interface ZipEntry {
  name: string;
  bytes: Uint8Array;
}

// STL compresses by about half at level 1 and barely more at higher levels, which cost several times
// the CPU; the zip is a download, not an archive, so speed wins.
const ZIP_LEVEL = 1;
// A fixed date keeps the zip byte-identical for the same request (archiver stamps entries with "now").
const FIXED_DATE = new Date('2026-01-01T00:00:00Z');

/** Streams the entries into a zip written to `out`; resolves when the archive is complete. */
export async function writeZip(entries: ZipEntry[], out: Writable): Promise<void> {
  const archive = new ZipArchive({ zlib: { level: ZIP_LEVEL } });
  const done = new Promise<void>((resolve, reject) => {
    archive.on('error', reject);
    out.on('error', reject);
    out.on('finish', () => resolve());
  });
  archive.pipe(out);
  for (const entry of entries)
    archive.append(Buffer.from(entry.bytes.buffer, entry.bytes.byteOffset, entry.bytes.byteLength), {
      name: entry.name,
      date: FIXED_DATE,
    });
  await archive.finalize();
  await done;
}

/** A download's entries: manifest.json first (pretty-printed), then the builder's files in their order. */
export function withManifest(manifest: unknown, files: readonly ZipEntry[]): ZipEntry[] {
  const bytes = new TextEncoder().encode(`${JSON.stringify(manifest, null, 2)}\n`);
  return [{ name: 'manifest.json', bytes }, ...files];
}

/**
 * A download name that says what is inside and changes with the request: "seamwright-key-kit-3f9a1c2e.zip".
 * The hash is of the resolved request, so the same request always downloads under the same name.
 */
export function downloadName(label: string, request: unknown): string {
  const digest = createHash('sha256').update(JSON.stringify(request)).digest('hex').slice(0, 8);
  return `seamwright-${label}-${digest}.zip`;
}

/** A zip's bytes as a Buffer for `res.send`, without copying (a thread hop hands back a plain Uint8Array). */
export function asBuffer(bytes: Uint8Array): Buffer {
  return Buffer.from(bytes.buffer, bytes.byteOffset, bytes.byteLength);
}
