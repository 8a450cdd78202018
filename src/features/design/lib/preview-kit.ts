import { offsetConvexPolygon } from '../../../../shared/geometry/section/offset-convex-polygon';
import { pocketSection } from '../../../../shared/geometry/section/pocket-section';
import { keySection } from '../../../../shared/geometry/section/key-section';
import { meshKit } from '../../../../shared/kit/build-kit';
import type { KitManifest } from '../../../../shared/kit/kit-manifest';
import type { ResolvedKitRequest } from '../../../../shared/schemas/kit-request';
import { keyInPlace } from './key-in-place';
import { footprintsAt, type Footprint2 } from './footprints-at';
import { toRenderMesh, type RenderMesh } from './render-mesh';

/** Outlines on the cut face, in mm, for the face drawing and the section detail. */
export interface KitOutlines {
  /** Key joints: the key's section as printed (after any scale), centred on the origin, counter-clockwise. */
  readonly key?: Array<[number, number]>;
  /** Key joints: a pocket's mouth (the section grown by the clearance), centred on the origin. */
  readonly pocket?: Array<[number, number]>;
  /** Dovetail joints: each rail's and each slot's box on the face, in rail order. */
  readonly rails?: Footprint2[];
  readonly slots?: Footprint2[];
}

/** What the preview shows: the manifest the server would write, one mesh per kit file, and the keys in place. */
export interface PreviewKit {
  readonly manifest: KitManifest;
  /** One mesh per `manifest.parts` entry, same order, in the kit file's own frame, ready to draw. */
  readonly meshes: RenderMesh[];
  /** Key joints: one key stood up in the joint frame (axis along z, centred on the origin). */
  readonly keyInPlace?: RenderMesh;
  readonly outlines: KitOutlines;
}

/**
 * Builds everything the design screen shows for one request with the server's own `meshKit` (the code behind
 * `buildKit`), without writing STL bytes. Pure; runs in the preview worker.
 *
 * @param request - a resolved kit request
 * @returns the manifest, meshes and outlines
 * @throws GeometryError when the keys or rails do not fit (numbers in the message)
 */
export function previewKit(request: ResolvedKitRequest): PreviewKit {
  const { manifest, meshes } = meshKit(request);
  if (request.joint === 'key') {
    const k = request.key;
    const scale = manifest.keyScale ?? 1;
    const sectionParams = { ...k, chordTolerance: request.chordTolerance };
    const section = keySection(sectionParams);
    // The pocket is drawn as it is cut: a round one circumscribes its circle (see pocketSection).
    const pocketBase = pocketSection(sectionParams);
    const growth = manifest.derived.pocketGrowthPerSide ?? 0;
    const keyMesh = meshes[0]!;
    return {
      manifest,
      meshes: meshes.map(toRenderMesh),
      keyInPlace: toRenderMesh(keyInPlace(keyMesh, (k.width / 2) * scale)),
      outlines: {
        key: section.map(([x, y]) => [x * scale, y * scale]),
        pocket: (growth > 0 ? offsetConvexPolygon(pocketBase, growth) : pocketBase).map(([x, y]) => [x, y]),
      },
    };
  }
  const railPart = manifest.parts[0]!;
  const slotPart = manifest.parts[1]!;
  return {
    manifest,
    meshes: meshes.map(toRenderMesh),
    outlines: {
      rails: footprintsAt(meshes[0]!, railPart.positions ?? []),
      slots: footprintsAt(meshes[1]!, slotPart.positions ?? []),
    },
  };
}
