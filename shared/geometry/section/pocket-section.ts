import { keptFeature } from '../min-feature';
import type { Vec2 } from '../units';
import { keySection, type KeySectionParams } from './key-section';
import { offsetConvexPolygon } from './offset-convex-polygon';

/**
 * The nominal outline of the pocket that takes a key (before any clearance), centred on the origin: a convex,
 * counter-clockwise polygon with the same number of corners, in the same order and directions, as
 * {@link keySection} gives for the same params, so pocket and key rings correspond corner for corner.
 *
 * Square, rect and hex sections are exact, so the pocket outline is the key section itself (the same array
 * values, so those kits stay byte-identical). A round key is a polygon inscribed in its circle (its flats
 * fall short of the radius by the sagitta), so the round pocket is the polygon that circumscribes the
 * nominal circle instead: each chord of the key moves out by its own sagitta, r − (its distance from the
 * centre), until it is tangent to the circle of radius `width / 2`. A round key's flat is a straight line
 * already and stays where it is. Growing this outline by a clearance c (`offsetConvexPolygon`) puts every
 * flat of the pocket on the circle of radius r + c, so the key (inside its circle of radius r) never comes
 * nearer than c to the pocket wall, however coarse the chord tolerance.
 *
 * @param params - the key's section params (see {@link KeySectionParams}); `chordTolerance` default 0.02 mm
 * @returns corners in mm, counter-clockwise
 * @example
 * pocketSection({ shape: 'square', width: 10 }); // [[-5, -5], [5, -5], [5, 5], [-5, 5]], as keySection
 * pocketSection({ shape: 'round', width: 8 }); // 32 corners at 4 / cos(π/32) mm, flats at 4 mm
 */
export function pocketSection(params: KeySectionParams): Vec2[] {
  const section = keySection(params);
  if (params.shape !== 'round') return section;
  const r = params.width / 2;
  // keySection closes a round key with a flat by its flat: the edge from the last corner back to the first.
  const flatEdge = keptFeature(params.flat ?? 0) > 0 ? section.length - 1 : -1;
  const sagittas = section.map((p, i) => {
    if (i === flatEdge) return 0;
    const q = section[(i + 1) % section.length]!;
    // Distance of the chord's line from the centre, computed as offsetConvexPolygon computes its line, so
    // the moved line lands on r to within a rounding step.
    const len = Math.hypot(q[0] - p[0], q[1] - p[1]);
    const nx = (q[1] - p[1]) / len;
    const ny = -(q[0] - p[0]) / len;
    return r - (nx * p[0] + ny * p[1]);
  });
  return offsetConvexPolygon(section, sagittas);
}
