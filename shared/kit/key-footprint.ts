import type { Footprint } from '../geometry/layout';
import { offsetConvexPolygon } from '../geometry/section/offset-convex-polygon';
import type { Vec2 } from '../geometry/units';
import type { KeyOptions } from '../schemas/kit-key-options';

/**
 * The outline the layout keeps walls around: the pocket's mouth (the pocket's nominal outline grown by the
 * clearance and the entry chamfer), as the smallest circle about the centre for round keys, or the
 * axis-aligned box for the others. Both contain the real outline, so the walls are at least the margin.
 *
 * @param section - the pocket's nominal outline (`pocketSection`: the key's section, or for a round key the
 *   polygon circumscribing its circle), mm, centred on the origin
 * @param growth - clearance plus entry chamfer per side, mm (0 or more)
 * @param round - true for round keys (a circle footprint)
 * @returns a layout footprint in mm
 * @example
 * keyFootprint(pocketSection({ shape: 'square', width: 10 }), 0.2, false); // { kind: 'rect', width: 10.4, height: 10.4 }
 */
export function keyFootprint(section: readonly Vec2[], growth: number, round: boolean): Footprint {
  const mouth = growth > 0 ? offsetConvexPolygon(section, growth) : section;
  if (round) return { kind: 'circle', diameter: 2 * Math.max(...mouth.map(([x, y]) => Math.hypot(x, y))) };
  const xs = mouth.map(([x]) => x);
  const ys = mouth.map(([, y]) => y);
  return { kind: 'rect', width: Math.max(...xs) - Math.min(...xs), height: Math.max(...ys) - Math.min(...ys) };
}

/**
 * The key in words for layout messages: "a 10 mm square key", "a 10 × 6 mm rect key", "an 8 mm round key".
 *
 * @param key - resolved key options
 * @returns the phrase, with its article
 * @example
 * keyLabel({ shape: 'hex', width: 8 }); // "an 8 mm hex key"
 */
export function keyLabel(key: Pick<KeyOptions, 'shape' | 'width' | 'length'>): string {
  const size = key.shape === 'rect' ? `${key.width} × ${key.length ?? key.width} mm` : `${key.width} mm`;
  const article = /^(8|11|18)/.test(size) && !/^1[0-9]{2}/.test(size) ? 'an' : 'a';
  return `${article} ${size} ${key.shape} key`;
}
