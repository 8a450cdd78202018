/**
 * Smallest chamfer, flat or other feature, in mm, that a kit keeps; anything from 0 up to this is rejected by
 * the schema and dropped (built as 0) by the builders. Why: the STL writers snap every corner to JSCAD's grid
 * of 1e-5 × the file's mean bounding-box side, up to 0.014 mm for a cutter file spanning a 2000 mm face. Two
 * corners closer than that can snap together, and the faces between them vanish, leaving holes; 0.02 mm keeps
 * every pair of corners at least one grid step apart. No printer resolves a feature that small anyway.
 *
 * @example
 * MIN_FEATURE_MM; // 0.02
 */
export const MIN_FEATURE_MM = 0.02;

/**
 * A feature size with anything below {@link MIN_FEATURE_MM} turned into 0.
 *
 * @param mm - a chamfer, flat or similar size in mm
 * @returns `mm`, or 0 when it is below the smallest feature a kit keeps
 * @example
 * keptFeature(0.005); // 0
 * keptFeature(0.4); // 0.4
 */
export function keptFeature(mm: number): number {
  return mm < MIN_FEATURE_MM ? 0 : mm;
}
