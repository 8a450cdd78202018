import type { Point2 } from './footprint';
import { minKeyDistance } from './min-key-distance';
import { turnVector } from './turn-vector';

/** Inner-ring radii tried, as fractions of the reach; the refinement settles the exact one. */
const INNER_STEPS = 12;

/**
 * Ring layouts of exactly `count` keys on a round room: all keys on the rim; all but one on the
 * rim and one at the centre; or an outer ring on the rim, an inner ring (at the radius, of 12
 * tried, that keeps the keys farthest apart) and optionally a key at the centre. Rings start at
 * angle 0 or half a step on, so both orientations of the pattern are tried. The best spread-out
 * layouts of a disc have this shape for up to about 18 keys.
 *
 * @param reach - how far (mm) a centre may go along the unit direction (ux, uy)
 * @param count - keys per layout, 2 or more
 * @returns the layouts (mm), in a fixed order
 * @example
 * ringLayouts(() => 10, 3)[0]; // an equilateral triangle on a 10 mm circle
 */
export function ringLayouts(reach: (ux: number, uy: number) => number, count: number): Point2[][] {
  // Rim points per ring size and phase, computed once: the inner-radius scan only rescales them.
  const rims = new Map<number, Point2[]>();
  const ring = (n: number, scale: number, phase: number): Point2[] => {
    let rim = rims.get(2 * n + phase);
    if (!rim) {
      rim = Array.from({ length: n }, (_, i): Point2 => {
        const [ux, uy] = turnVector((i + phase) / n);
        const r = reach(ux, uy);
        return [ux * r, uy * r];
      });
      rims.set(2 * n + phase, rim);
    }
    return rim.map(([x, y]): Point2 => [x * scale, y * scale]);
  };
  const out: Point2[][] = [];
  for (const phase of [0, 0.5]) {
    out.push(ring(count, 1, phase));
    if (count >= 4) out.push([[0, 0], ...ring(count - 1, 1, phase)]);
  }
  for (let outer = Math.ceil(count / 2); outer <= count - 2; outer++) {
    for (const centre of [0, 1]) {
      const inner = count - outer - centre;
      if (inner < 2) continue;
      for (const phase of [0, 0.5]) {
        for (const shift of [0, 0.5]) {
          let best: Point2[] | null = null;
          let bestGap = -1;
          for (let s = 1; s < INNER_STEPS; s++) {
            const keys = [...ring(outer, 1, phase), ...ring(inner, s / INNER_STEPS, shift)];
            if (centre) keys.push([0, 0]);
            const gap = minKeyDistance(keys);
            if (gap > bestGap) [best, bestGap] = [keys, gap];
          }
          out.push(best!);
        }
      }
    }
  }
  return out;
}
