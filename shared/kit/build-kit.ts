import { geom3ToMesh } from '../geometry/mesh';
import type { TriangleMesh } from '../geometry/mesh';
import { writeAsciiStl, writeBinaryStl } from '../geometry/stl';
import type { ResolvedKitRequest } from '../schemas/kit-request';
import { dovetailKitPlan } from './dovetail-kit-plan';
import { keyKitPlan } from './key-kit-plan';
import { KIT_FRAME } from './kit-frame';
import type { KitManifest } from './kit-manifest';
import type { KitPlan } from './kit-part-plan';
import { kitReadme } from './kit-readme';
import { partSummary } from './part-summary';

/** One file of a kit: its name inside the zip and its bytes. */
export interface KitFile {
  readonly name: string;
  readonly bytes: Uint8Array;
}

/**
 * Builds a joint kit: one STL per part (binary, or ASCII when `request.format` is "ascii") and README.txt,
 * plus the manifest (the server adds manifest.json and zips). Pure and deterministic: the same request gives
 * byte-identical files.
 *
 * Key joints give `key.stl` (print `quantity` of it), `pocket-cutter-A.stl` and `pocket-cutter-B.stl` (every
 * pocket in place, subtract from each half); dovetail joints give `rail-A.stl` (join onto half A) and
 * `slot-cutter-B.stl` (subtract from half B).
 *
 * @param request - a resolved kit request (`kitRequestSchema.parse(body)`)
 * @returns `{ manifest, files }`, files in manifest order with README.txt last
 * @throws GeometryError with the numbers when the geometry is impossible (keys or rails do not fit)
 * @example
 * const { manifest, files } = buildKit(kitRequestSchema.parse({ joint: 'key', material: 'PLA', fit: 'snug',
 *   face: { shape: 'rect', width: 80, height: 60 }, key: { shape: 'square', width: 10, depth: 8, count: 8 } }));
 * files.map((f) => f.name); // ['key.stl', 'pocket-cutter-A.stl', 'pocket-cutter-B.stl', 'README.txt']
 */
export function buildKit(request: ResolvedKitRequest): { manifest: KitManifest; files: KitFile[] } {
  const { manifest, meshes } = meshKit(request);
  const files: KitFile[] = manifest.parts.map((part, i) => ({
    name: part.file,
    bytes: stlBytes(meshes[i]!, part.file, request.format),
  }));
  files.push({ name: 'README.txt', bytes: new TextEncoder().encode(kitReadme(manifest)) });
  return { manifest, files };
}

/**
 * The manifest alone, as `POST /api/kits/summary` returns it: the same numbers as {@link buildKit}'s (the
 * meshes are built and measured) without writing any STL bytes.
 *
 * @param request - a resolved kit request
 * @returns the kit's manifest
 * @throws GeometryError like {@link buildKit}
 * @example
 * summarizeKit(request).parts[0].quantity; // 8
 */
export function summarizeKit(request: ResolvedKitRequest): KitManifest {
  return meshKit(request).manifest;
}

/**
 * Plans and meshes a kit without writing any file: the manifest plus one mesh per `manifest.parts` entry, in
 * the same order. {@link buildKit}, {@link summarizeKit} and the design screen's preview all start here, so
 * the preview shows exactly the numbers the download will carry.
 *
 * @param request - a resolved kit request
 * @returns the manifest and the meshes
 * @throws GeometryError like {@link buildKit}
 * @example
 * meshKit(request).meshes.length === meshKit(request).manifest.parts.length; // true
 */
export function meshKit(request: ResolvedKitRequest): { manifest: KitManifest; meshes: TriangleMesh[] } {
  const plan: KitPlan = request.joint === 'key' ? keyKitPlan(request) : dovetailKitPlan(request);
  const meshes = plan.parts.map((p) => geom3ToMesh(p.solid));
  const manifest: KitManifest = {
    units: 'mm',
    clearancePerSide: plan.clearancePerSide,
    ...(plan.keyScale !== undefined ? { keyScale: plan.keyScale } : {}),
    request,
    parts: plan.parts.map((p, i) => partSummary(p, meshes[i]!)),
    warnings: plan.warnings,
    fit: { derivation: plan.derivation, steps: plan.steps },
    frame: KIT_FRAME,
    derived: plan.derived,
    printNotes: plan.printNotes,
  };
  return { manifest, meshes };
}

function stlBytes(mesh: TriangleMesh, file: string, format: 'binary' | 'ascii'): Uint8Array {
  const name = file.replace(/\.stl$/, '');
  if (format === 'ascii') return new TextEncoder().encode(writeAsciiStl(mesh, name));
  return writeBinaryStl(mesh, { header: `Seamwright ${name}; units: mm; cut face at z = 0` });
}
