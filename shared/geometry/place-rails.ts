import type { Face } from '../schemas/face';
import { GeometryError } from './geometry-error';
import { faceBounds } from './layout/face-bounds';
import { faceSpanAtX } from './layout/face-span-at-x';
import { validatePolygon } from './layout/validate-polygon';
import { formatMm } from './layout/format-mm';
import { MIN_FEATURE_MM } from './min-feature';
import { CUTTER_OVERSHOOT_MM } from './pocket-cutter';
import type { DovetailSectionParams } from './section/dovetail-section';
import { dovetailSection } from './section/dovetail-section';
import { offsetConvexPolygon } from './section/offset-convex-polygon';

/** What {@link placeRails} needs, in mm (angles in radians). */
export interface PlaceRailsParams extends DovetailSectionParams {
  readonly face: Face;
  /** Number of parallel rails, ≥ 1. */
  readonly count: number;
  /** Centre-to-centre spacing along x; default: the face's x extent split into `count` equal strips. */
  readonly pitch?: number;
  /** Gap per side between rail and slot. */
  readonly clearance: number;
  /** Least wall between two slots, and between a slot and the face's side edges. */
  readonly margin: number;
  /** Rail length; default as long as the face allows at the rail. */
  readonly length?: number;
  /** Close the slot's +y end, leaving `endStopWall` of material before the face's edge. */
  readonly endStop: boolean;
  readonly endStopWall: number;
  /** The rail's lead-in chamfer (the rail must be longer than both chamfers). */
  readonly chamfer: number;
}

/** Where one rail and its slot go: the rail's centre line x and the y ranges of rail and slot, in mm. */
export interface RailPlacement {
  readonly x: number;
  readonly y0: number;
  readonly y1: number;
  readonly slotY0: number;
  readonly slotY1: number;
}

/**
 * Places parallel dovetail rails along y, spaced along x. Each rail runs as far as the face allows across
 * its whole top width (the shortest span of the face over that width); its slot runs
 * {@link CUTTER_OVERSHOOT_MM} past the face's edge at each open end so the rail can slide in, or, with an
 * end stop, stops `endStopWall` short of the +y edge and the rail stops one clearance before that.
 *
 * @param params - see {@link PlaceRailsParams}
 * @returns one placement per rail, in ascending x
 * @throws GeometryError RAIL_DOES_NOT_FIT with the numbers when slots overlap or leave walls thinner than
 *   `margin`, reach past the face, or the face is too short for the rail; POLYGON_INVALID (or WORK_LIMIT)
 *   for a polygon face that crosses itself
 * @example
 * placeRails({ face: { shape: 'rect', width: 90, height: 60 }, count: 3, rootWidth: 10, height: 6,
 *   flankAngle: radians(Math.atan(1 / 6)), clearance: 0.15, margin: 2, endStop: false, endStopWall: 3,
 *   chamfer: 0.5 }).map((r) => r.x); // [-30, 0, 30]
 */
export function placeRails(params: PlaceRailsParams): RailPlacement[] {
  const { face, count, margin } = params;
  if (face.shape === 'polygon') validatePolygon(face.points);
  const railHalf = Math.max(...dovetailSection(params).map(([u]) => u));
  const slotRing = offsetConvexPolygon(dovetailSection(params), [
    CUTTER_OVERSHOOT_MM,
    params.clearance,
    params.clearance,
    params.clearance,
  ]);
  const slotHalf = Math.max(...slotRing.map(([u]) => u));
  const b = faceBounds(face);
  const pitch = params.pitch ?? (b.maxX - b.minX) / count;
  const start = params.pitch === undefined ? b.minX + pitch / 2 : (b.minX + b.maxX) / 2 - ((count - 1) * pitch) / 2;
  if (count > 1 && pitch - 2 * slotHalf < margin) {
    throw new GeometryError(
      'RAIL_DOES_NOT_FIT',
      `${count} dovetail slots ${formatMm(2 * slotHalf, 'up')} mm wide at ${formatMm(pitch)} mm pitch leave ` +
        `${formatMm(pitch - 2 * slotHalf, 'down')} mm of wall between them; at least ${formatMm(margin)} mm is needed: ` +
        `use a pitch of at least ${formatMm(2 * slotHalf + margin, 'up')} mm, fewer rails or a narrower rail`,
    );
  }
  return Array.from({ length: count }, (_, i) => placeOne(params, start + i * pitch, railHalf, slotHalf));
}

function placeOne(params: PlaceRailsParams, x: number, railHalf: number, slotHalf: number): RailPlacement {
  const { face, margin, clearance } = params;
  for (const side of [-1, 1]) {
    const edge = x + side * (slotHalf + margin);
    if (faceSpanAtX(face, edge) === null) {
      throw new GeometryError(
        'RAIL_DOES_NOT_FIT',
        `the dovetail slot at x = ${formatMm(x)} mm is ${formatMm(2 * slotHalf, 'up')} mm wide and needs ` +
          `${formatMm(margin)} mm of wall beside it, out to x = ${formatMm(edge)} mm, which is past the face's edge`,
      );
    }
  }
  const rail = spanOver(face, x, railHalf, 'shortest');
  const slot = spanOver(face, x, slotHalf, 'longest');
  const end = params.endStop ? rail.maxY - params.endStopWall - clearance : rail.maxY;
  const room = end - rail.minY;
  const length = params.length ?? room;
  if (length > room + 1e-9 || length < 2 * params.chamfer + MIN_FEATURE_MM) {
    const need =
      length > room
        ? `a ${formatMm(length)} mm rail`
        : `a rail longer than its two ${formatMm(params.chamfer)} mm chamfers`;
    throw new GeometryError(
      'RAIL_DOES_NOT_FIT',
      `the face has room for a dovetail rail ${formatMm(Math.max(0, room), 'down')} mm long at x = ${formatMm(x)} mm` +
        `${params.endStop ? ` (after a ${formatMm(params.endStopWall)} mm end stop)` : ''}; ${need} was asked for`,
    );
  }
  const y1 = params.endStop ? end : (rail.minY + rail.maxY) / 2 + length / 2;
  const slotY1 = params.endStop ? rail.maxY - params.endStopWall : slot.maxY + CUTTER_OVERSHOOT_MM;
  return { x, y0: y1 - length, y1, slotY0: slot.minY - CUTTER_OVERSHOOT_MM, slotY1 };
}

/** The face's span along y over the strip x ± half: the part every line in it crosses, or all of them. */
function spanOver(face: Face, x: number, half: number, which: 'shortest' | 'longest'): { minY: number; maxY: number } {
  let minY = which === 'shortest' ? -Infinity : Infinity;
  let maxY = which === 'shortest' ? Infinity : -Infinity;
  // Nine lines across the strip: exact for rect faces, close for round and polygon ones.
  for (let k = 0; k <= 8; k++) {
    const s = faceSpanAtX(face, x - half + (half * k) / 4) ?? { minY: 0, maxY: 0 };
    minY = which === 'shortest' ? Math.max(minY, s.minY) : Math.min(minY, s.minY);
    maxY = which === 'shortest' ? Math.min(maxY, s.maxY) : Math.max(maxY, s.maxY);
  }
  return { minY, maxY };
}
