import { keptFeature } from '../min-feature';
import type { Vec2 } from '../units';
import { offsetConvexPolygon } from './offset-convex-polygon';
import { segmentsForRadius } from './segments-for-radius';

/** Cross-section shapes of a key pin. */
export type KeyShape = 'square' | 'rect' | 'round' | 'hex';

/** Parameters of a key cross-section, in mm. */
export interface KeySectionParams {
  readonly shape: KeyShape;
  /** Size across x: side of a square or rect, flat-to-flat of a hex, diameter of a round key. */
  readonly width: number;
  /** Side along y of a `rect` key; ignored by the other shapes. */
  readonly length?: number;
  /** Depth of the flat on a round key (rotation lock), cut on the −x side; 0 = none. Default 0; below MIN_FEATURE_MM none. */
  readonly flat?: number;
  /** Largest chord deviation of round shapes, mm. Default 0.02. */
  readonly chordTolerance?: number;
}

/**
 * The key's cross-section in the cut plane, centred on the origin: a convex, counter-clockwise polygon.
 * Square and rect keys are axis-aligned; a hex has its flats facing ±x (`width` is flat-to-flat across x);
 * a round key is a polygon inscribed in the circle of diameter `width` with facets facing ±x and ±y
 * (segments from {@link segmentsForRadius}); a round key with a flat is cut by the line x = −(r − flat) and
 * its arc re-sampled between the flat's ends, so every corner lies exactly on the circle. A round key thus
 * never reaches past its circle; its pocket is the circumscribing polygon (`pocketSection`), never this one
 * grown, or the pocket's flats would fall short of r + clearance by the sagitta.
 *
 * With `inset` > 0 it returns the end ring of a 45° chamfer `inset` mm deep, with the same number of
 * corners in the same order as the full section, so the two can be lofted corner to corner: polygons move
 * every edge inward by `inset`; a round key with a flat is re-sampled on the circle of radius r − inset
 * with its flat also moved in by `inset`.
 *
 * @param params - see {@link KeySectionParams}
 * @param inset - chamfer depth in mm, below half the smallest width; default 0 (the full section)
 * @returns corners in mm, counter-clockwise
 * @example
 * keySection({ shape: 'square', width: 10 }); // [[-5, -5], [5, -5], [5, 5], [-5, 5]]
 * keySection({ shape: 'square', width: 10 }, 1); // [[-4, -4], [4, -4], [4, 4], [-4, 4]]
 */
export function keySection(params: KeySectionParams, inset = 0): Vec2[] {
  const { shape, width } = params;
  const half = width / 2;
  const flat = shape === 'round' ? keptFeature(params.flat ?? 0) : 0;
  if (flat > 0) return flatRoundSection(half, flat, params.chordTolerance ?? 0.02, inset);
  let section: Vec2[];
  if (shape === 'square' || shape === 'rect') {
    const hy = shape === 'rect' ? (params.length ?? width) / 2 : half;
    section = [
      [-half, -hy],
      [half, -hy],
      [half, hy],
      [-half, hy],
    ];
  } else if (shape === 'hex') {
    // Circumradius of a hexagon whose flat-to-flat distance is `width`; corners at 30° + k·60°.
    const r = width / Math.sqrt(3);
    section = Array.from({ length: 6 }, (_, k) => polar(r, Math.PI / 6 + (k * Math.PI) / 3));
  } else {
    // Corners at (i + ½)·2π/n put a facet on −x: the key rests on it when printed lying down.
    const n = segmentsForRadius(half, params.chordTolerance ?? 0.02);
    section = Array.from({ length: n }, (_, i) => polar(half, ((i + 0.5) * 2 * Math.PI) / n));
  }
  return inset > 0 ? offsetConvexPolygon(section, -inset) : section;
}

/**
 * A round section of radius `r` with a flat `flat` mm deep on the −x side (the side it is printed on).
 * The arc runs counter-clockwise from the flat's lower end to its upper end; the closing edge is the flat.
 * The number of arc steps comes from the full radius so an inset ring matches the full one corner for corner.
 */
function flatRoundSection(r: number, flat: number, tolerance: number, inset: number): Vec2[] {
  const n = segmentsForRadius(r, tolerance);
  const fullEnd = Math.acos(-(r - flat) / r);
  // Same angular step as the full circle or finer, so the chords stay within the tolerance.
  const steps = Math.max(2, Math.ceil((n * fullEnd) / Math.PI));
  const ri = r - inset;
  // Where the flat line x = −(ri − flat) meets the circle of radius ri, measured from +x.
  const end = Math.acos(-(ri - flat) / ri);
  return Array.from({ length: steps + 1 }, (_, i) => polar(ri, -end + (2 * end * i) / steps));
}

function polar(r: number, angle: number): Vec2 {
  return [r * Math.cos(angle), r * Math.sin(angle)];
}
