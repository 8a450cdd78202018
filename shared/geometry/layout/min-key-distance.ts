import type { Point2 } from './footprint';

/**
 * The smallest distance between any two keys, centre to centre, in mm: the number a spread-out
 * layout maximises. Infinity for fewer than 2 keys.
 *
 * @param keys - key centres (mm)
 * @returns the distance in mm
 * @example
 * minKeyDistance([[0, 0], [3, 4], [10, 0]]); // 5
 */
export function minKeyDistance(keys: Point2[]): number {
  let best = Infinity;
  for (let i = 0; i < keys.length; i++) {
    for (let j = i + 1; j < keys.length; j++) {
      best = Math.min(best, (keys[i]![0] - keys[j]![0]) ** 2 + (keys[i]![1] - keys[j]![1]) ** 2);
    }
  }
  return Math.sqrt(best);
}
