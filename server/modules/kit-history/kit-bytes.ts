import { createHash } from 'node:crypto';
import { Writable } from 'node:stream';
import type { KitFile } from '../../../shared/kit/build-kit';
import type { KitFileHash } from '../../../shared/schemas/kit-history';
import { withManifest, writeZip } from '../kits/kit-zip';

/** SHA-256 (hex) and size of every STL of a kit: what a later rebuild is compared with. */
export function stlHashes(files: readonly KitFile[]): KitFileHash[] {
  return files
    .filter((f) => f.name.endsWith('.stl'))
    .map((f) => ({
      name: f.name,
      bytes: f.bytes.byteLength,
      sha256: createHash('sha256').update(f.bytes).digest('hex'),
    }));
}

/** A kit or coupon as one zip in memory: manifest.json first, then the STLs and README.txt (as POST /api/kits sends it). */
export async function zipKit(kit: { manifest: unknown; files: readonly KitFile[] }): Promise<Buffer> {
  const chunks: Buffer[] = [];
  const sink = new Writable({
    write(chunk: Buffer, _encoding, done) {
      chunks.push(chunk);
      done();
    },
  });
  await writeZip(withManifest(kit.manifest, kit.files), sink);
  return Buffer.concat(chunks);
}
