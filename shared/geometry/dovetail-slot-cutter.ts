import type { Geom3 } from './solid/jscad-types';
import { CUTTER_OVERSHOOT_MM } from './pocket-cutter';
import type { DovetailSectionParams } from './section/dovetail-section';
import { dovetailSection } from './section/dovetail-section';
import { offsetConvexPolygon } from './section/offset-convex-polygon';
import { loftSolid } from './solid/loft-solid';

/** Parameters of one slot cutter, in mm; the section fields are the rail's ({@link DovetailSectionParams}). */
export interface DovetailSlotCutterParams extends DovetailSectionParams {
  /** Gap per side between rail and slot on both flanks and the top, mm. */
  readonly clearance: number;
  /** Centre line of the slot, x in mm (the rail's). */
  readonly x: number;
  /** Where the slot starts and ends along y, mm (y0 < y1); past the face's edge at an open end. */
  readonly y0: number;
  readonly y1: number;
}

/**
 * The solid to subtract from half B for one rail: the rail's section grown by the clearance on both flanks
 * and the top (each flank moved out along its own normal, so the gap is the clearance measured square to
 * the flank), with the flanks continued down to {@link CUTTER_OVERSHOOT_MM} below z = 0 so the subtraction
 * leaves no skin on the face. No chamfer: the slot keeps its full width to its ends.
 *
 * @param params - see {@link DovetailSlotCutterParams}
 * @returns the cutter as a JSCAD geom3
 * @example
 * dovetailSlotCutter({ rootWidth: 10, height: 6, flankAngle: radians(Math.atan(1 / 6)), clearance: 0.15,
 *   x: 0, y0: -31, y1: 31 }); // z from −1 to 6.15
 */
export function dovetailSlotCutter(params: DovetailSlotCutterParams): Geom3 {
  const { x, y0, y1, clearance } = params;
  const ring = offsetConvexPolygon(dovetailSection(params), [CUTTER_OVERSHOOT_MM, clearance, clearance, clearance]);
  // Same proper rotation as the rail: loft along w = −y.
  return loftSolid(
    [
      { w: -y1, ring },
      { w: -y0, ring },
    ],
    (u, v, w) => [x + u, 0 - w, v],
  );
}
