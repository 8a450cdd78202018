/** Fewest segments Seamwright uses for any round shape, however coarse the tolerance. */
export const MIN_ROUND_SEGMENTS = 8;
/** Most segments for one round shape: caps the work a request can ask for. */
export const MAX_ROUND_SEGMENTS = 1024;

/**
 * Number of straight segments for a circle of radius `radius` so that no chord strays more than
 * `chordTolerance` from the true circle (the sagitta r·(1 − cos(π/n)) ≤ tol):
 * n = ceil(π / acos(1 − tol / r)), at least 8, rounded up to a multiple of 4 so the polygon is
 * symmetric across x and y and has flat facets facing ±x and ±y (a round key then rests on a facet).
 *
 * @param radius - circle radius in mm, > 0
 * @param chordTolerance - largest chord deviation in mm, > 0 (Seamwright's default is 0.02 mm)
 * @returns segment count, a multiple of 4 between 8 and 1024
 * @example
 * segmentsForRadius(4, 0.02); // 32
 */
export function segmentsForRadius(radius: number, chordTolerance: number): number {
  // A tolerance of a radius or more would allow a degenerate polygon: the floor of 8 covers it.
  const ratio = Math.min(chordTolerance / radius, 1);
  const exact = ratio >= 1 ? MIN_ROUND_SEGMENTS : Math.ceil(Math.PI / Math.acos(1 - ratio));
  const n = Math.min(Math.max(exact, MIN_ROUND_SEGMENTS), MAX_ROUND_SEGMENTS);
  return Math.ceil(n / 4) * 4;
}
