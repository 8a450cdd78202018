import type { Radians, Vec2 } from '../units';

/** Parameters of a dovetail rail's cross-section, in mm and radians. */
export interface DovetailSectionParams {
  /** Width where the rail meets the face (z = 0), mm. */
  readonly rootWidth: number;
  /** Height of the rail above the face, mm. */
  readonly height: number;
  /** Flank angle from the vertical, radians: atan(1/6) for a 1:6 slope. */
  readonly flankAngle: Radians;
}

/**
 * The rail's cross-section in the (x, z) plane, centred on x = 0: a trapezoid narrow at the face (z = 0)
 * and wider at the top, counter-clockwise. Edges in order: base, right flank, top, left flank — the
 * order the rail and slot builders use when they move edges by different amounts.
 * Top width = rootWidth + 2 · height · tan(flankAngle).
 *
 * @param params - see {@link DovetailSectionParams}
 * @returns four corners [x, z] in mm: base left, base right, top right, top left
 * @example
 * dovetailSection({ rootWidth: 10, height: 6, flankAngle: radians(Math.atan(1 / 6)) });
 * // [[-5, 0], [5, 0], [6, 6], [-6, 6]]
 */
export function dovetailSection(params: DovetailSectionParams): Vec2[] {
  const { rootWidth, height, flankAngle } = params;
  const root = rootWidth / 2;
  const top = root + height * Math.tan(flankAngle);
  return [
    [-root, 0],
    [root, 0],
    [top, height],
    [-top, height],
  ];
}
