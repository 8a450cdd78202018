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
