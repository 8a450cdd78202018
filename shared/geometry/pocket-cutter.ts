import type { Geom3 } from './solid/jscad-types';
import { keptFeature } from './min-feature';
import { offsetConvexPolygon } from './section/offset-convex-polygon';
import { loftSolid } from './solid/loft-solid';
import type { LoftSlice } from './solid/loft-solid';
import type { Vec2 } from './units';

/** How far every cutter reaches past the cut face into the other half, mm: no coplanar skin after a subtraction. */
export const CUTTER_OVERSHOOT_MM = 1;

/** Parameters of one pocket cutter, in mm. */
export interface PocketCutterParams {
  /**
   * The pocket's nominal outline (from `pocketSection`: the key's section, or for a round key the polygon
   * circumscribing its circle), counter-clockwise, centred on the origin, mm.
   */
  readonly section: readonly Vec2[];
  /** Growth of the section per side (the fit clearance), mm; 0 for the `scale` strategy. */
  readonly clearance: number;
  /** Depth of the pocket below (half A) or above (half B) the face: keyLength / 2 + bottom gap, mm. */
  readonly depth: number;
  /** 45° flare at the pocket mouth, mm; 0 = none. Default 0; below MIN_FEATURE_MM it is left off. Below `depth`. */
  readonly entryChamfer?: number;
  /** Which half the pocket is cut into: A lies below z = 0, B above. */
  readonly half: 'A' | 'B';
  /** Pocket centre [x, y] on the face, mm. Default [0, 0]. */
  readonly position?: Vec2;
}

/**
 * The solid to subtract from one half to make one pocket: the pocket's nominal outline grown by the
 * clearance per side, `depth` deep into the half, flared by the entry chamfer at the face, and reaching
 * {@link CUTTER_OVERSHOOT_MM} past z = 0 into the other half. Lofted without booleans: a closed, outward
 * 2-manifold. Half B's cutter is half A's mirrored in z = 0. Every flat moves out by exactly the clearance
 * (and the flare's by clearance + entry chamfer), so a round pocket from `pocketSection` keeps its flats
 * tangent to the circle of radius r + clearance and its corners in the order of the key's.
 *
 * @param params - see {@link PocketCutterParams}
 * @returns the cutter as a JSCAD geom3
 * @example
 * pocketCutter({ section: pocketSection({ shape: 'square', width: 10 }), clearance: 0.15, depth: 8, half: 'A' });
 * // x and y from −5.15 to 5.15, z from −8 to 1
 * pocketCutter({ section: pocketSection({ shape: 'round', width: 8 }), clearance: 0.16, depth: 8, half: 'A' });
 * // flats facing ±x at ±4.16: 8.32 mm flat to flat
 */
export function pocketCutter(params: PocketCutterParams): Geom3 {
  const { depth, half } = params;
  const entry = keptFeature(params.entryChamfer ?? 0);
  const [px, py] = params.position ?? [0, 0];
  const grown = offsetConvexPolygon(params.section, params.clearance);
  const mouth = entry > 0 ? offsetConvexPolygon(params.section, params.clearance + entry) : grown;
  // Built for half A (into −z); half B uses the mirrored heights in reverse order so w still ascends.
  const slicesA: LoftSlice[] = [{ w: -depth, ring: grown }];
  if (entry > 0) slicesA.push({ w: -entry, ring: grown }, { w: 0, ring: mouth });
  slicesA.push({ w: CUTTER_OVERSHOOT_MM, ring: mouth });
  const slices = half === 'A' ? slicesA : slicesA.map((s) => ({ w: 0 - s.w, ring: s.ring })).reverse();
  return loftSolid(slices, (u, v, w) => [u + px, v + py, w]);
}
