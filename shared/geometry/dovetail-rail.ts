import type { Geom3 } from './solid/jscad-types';
import type { DovetailSectionParams } from './section/dovetail-section';
import { keptFeature } from './min-feature';
import { dovetailSection } from './section/dovetail-section';
import { offsetConvexPolygon } from './section/offset-convex-polygon';
import { loftSolid } from './solid/loft-solid';
import type { LoftSlice } from './solid/loft-solid';

/** Parameters of one dovetail rail, in mm; the section fields are those of {@link DovetailSectionParams}. */
export interface DovetailRailParams extends DovetailSectionParams {
  /** Centre line of the rail on the face, x in mm. */
  readonly x: number;
  /** Where the rail starts and ends along y, mm (y0 < y1). */
  readonly y0: number;
  readonly y1: number;
  /** Lead-in chamfer at both ends on the flanks and top (not the base), 45°, mm. Default 0; below MIN_FEATURE_MM left off. */
  readonly chamfer?: number;
}

/**
 * A sliding dovetail rail (the tail) to be joined onto half A: it stands on the face at z = 0 and rises
 * `height` into half B's side, running along y from y0 to y1 at x. Its ends are chamfered on the flanks and
 * top so it enters the slot easily; the base keeps its full width so it meets the face everywhere. Lofted
 * along y without booleans: a closed, outward 2-manifold.
 *
 * @param params - see {@link DovetailRailParams}
 * @returns the rail as a JSCAD geom3
 * @example
 * dovetailRail({ rootWidth: 10, height: 6, flankAngle: radians(Math.atan(1 / 6)), x: 0, y0: -30, y1: 30 });
 */
export function dovetailRail(params: DovetailRailParams): Geom3 {
  const { x, y0, y1 } = params;
  const chamfer = keptFeature(params.chamfer ?? 0);
  const full = dovetailSection(params);
  // The loft runs along w = −y: (u, v, w) → (x + u, −w, v) is a proper rotation, so faces stay outward.
  const slices: LoftSlice[] = [];
  if (chamfer > 0) {
    const end = offsetConvexPolygon(full, [0, -chamfer, -chamfer, -chamfer]);
    slices.push({ w: -y1, ring: end }, { w: -y1 + chamfer, ring: full });
    slices.push({ w: -y0 - chamfer, ring: full }, { w: -y0, ring: end });
  } else {
    slices.push({ w: -y1, ring: full }, { w: -y0, ring: full });
  }
  return loftSolid(slices, (u, v, w) => [x + u, 0 - w, v]);
}
