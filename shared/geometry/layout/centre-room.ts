import type { Face } from '../../schemas/face';
import type { KeyRegion } from './key-region';

/**
 * The region of legal pocket centres on a rect or round face, in closed form. `box`: a rect face
 * (any footprint), where centres may go anywhere in `region.bounds`. `round`: a round face, where
 * the centres' region is star-shaped about the origin and `reach(ux, uy)` is how far (mm) a centre
 * may go along the unit direction (ux, uy).
 */
export type CentreRoom =
  | { readonly kind: 'box'; readonly minX: number; readonly minY: number; readonly maxX: number; readonly maxY: number }
  | { readonly kind: 'round'; readonly reach: (ux: number, uy: number) => number };

/**
 * Describes where pocket centres may go on a rect or round face, so layouts can be built there
 * directly instead of searched for. Null for polygons (no closed form).
 *
 * @param face - the cut face (mm)
 * @param region - the layout problem on that face
 * @returns the room, or null for a polygon face
 * @example
 * centreRoom({ shape: 'rect', width: 80, height: 60 }, region); // { kind: 'box', minX: -32.84, ... }
 */
export function centreRoom(face: Face, region: KeyRegion): CentreRoom | null {
  if (face.shape === 'rect') return { kind: 'box', ...region.bounds };
  if (face.shape !== 'circle') return null;
  const fp = region.footprint;
  const rim = face.diameter / 2 - region.margin;
  if (fp.kind === 'circle') {
    const r = Math.max(0, rim - fp.diameter / 2);
    return { kind: 'round', reach: () => r };
  }
  // The corner farthest out touches the rim: (t·|ux| + a)² + (t·|uy| + b)² = rim², solved for t.
  const a = fp.width / 2;
  const b = fp.height / 2;
  const rest = rim * rim - a * a - b * b;
  return {
    kind: 'round',
    reach: (ux, uy) => {
      const p = a * Math.abs(ux) + b * Math.abs(uy);
      return Math.max(0, Math.sqrt(Math.max(0, p * p + rest)) - p);
    },
  };
}
