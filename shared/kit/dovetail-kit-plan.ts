import { resolveClearance } from '../fit';
import { dovetailRail } from '../geometry/dovetail-rail';
import { dovetailSlotCutter } from '../geometry/dovetail-slot-cutter';
import { placeRails } from '../geometry/place-rails';
import { mergeSolids } from '../geometry/solid/merge-solids';
import { radians } from '../geometry/units';
import type { ResolvedDovetailKitRequest } from '../schemas/kit-request';
import type { KitPlan } from './kit-part-plan';

const round = (mm: number) => Math.round(mm * 1000) / 1000;

/**
 * Plans a dovetail kit: the clearance from the fit engine, rails placed across the face, one file with every
 * rail in place (to join onto half A) and one with every slot cutter in place (to subtract from half B).
 *
 * @param request - a resolved kit request with `joint: 'dovetail'`
 * @returns the kit's files as solids plus its manifest numbers, see {@link KitPlan}
 * @throws GeometryError RAIL_DOES_NOT_FIT when the rails do not fit on the face (numbers in the message)
 * @example
 * dovetailKitPlan(kitRequestSchema.parse({ joint: 'dovetail', material: 'PETG', fit: 'slide',
 *   face: { shape: 'rect', width: 90, height: 60 }, dovetail: { rootWidth: 10, height: 6, count: 3 } }))
 *   .parts.map((p) => p.file); // ['rail-A.stl', 'slot-cutter-B.stl']
 */
export function dovetailKitPlan(request: ResolvedDovetailKitRequest): KitPlan {
  const d = request.dovetail;
  const fit = resolveClearance({ process: request.process, material: request.material, fit: request.fit, calibrationOffset: request.calibrationOffset, clearance: request.clearance });
  const c = fit.clearancePerSide;
  const section = { rootWidth: d.rootWidth, height: d.height, flankAngle: radians(Math.atan(1 / d.slope)) };
  const rails = placeRails({ ...section, face: request.face, count: d.count, pitch: d.pitch, clearance: c, margin: d.margin, length: d.length, endStop: d.endStop, endStopWall: d.endStopWall, chamfer: d.chamfer });
  const railSolid = mergeSolids(rails.map((r) => dovetailRail({ ...section, x: r.x, y0: r.y0, y1: r.y1, chamfer: d.chamfer })));
  const slotSolid = mergeSolids(rails.map((r) => dovetailSlotCutter({ ...section, clearance: c, x: r.x, y0: r.slotY0, y1: r.slotY1 })));
  const n = rails.length;
  const topWidth = d.rootWidth + (2 * d.height) / d.slope;
  return {
    parts: [
      { file: 'rail-A.stl', role: 'rail', half: 'A', quantity: 1, solid: railSolid, positions: rails.map((r) => [r.x, (r.y0 + r.y1) / 2]), note: `join onto half A (union): ${n} rail${n === 1 ? '' : 's'} standing on the cut face, in place` },
      { file: 'slot-cutter-B.stl', role: 'slot-cutter', half: 'B', quantity: 1, solid: slotSolid, positions: rails.map((r) => [r.x, (r.slotY0 + r.slotY1) / 2]), note: `subtract from half B: ${n} slot${n === 1 ? '' : 's'}, open at ${d.endStop ? 'the −y end' : 'both ends'}` },
    ],
    clearancePerSide: c,
    derivation: fit.derivation,
    steps: fit.steps,
    warnings: fit.warnings,
    derived: { railCount: n, shortestRailLength: round(Math.min(...rails.map((r) => r.y1 - r.y0))), topWidth: round(topWidth), flankAngleDeg: round(d.angleDeg), slope: round(d.slope), pitch: n > 1 ? round(rails[1]!.x - rails[0]!.x) : 0 },
    printNotes: [
      `print half A with its cut face up so the rails grow straight up: their flanks lean out ${round(d.angleDeg)}° from the vertical, which prints without support`,
      `half B: with its cut face down, each slot's roof is a bridge ${round(topWidth + 2 * c)} mm wide; print it on its side instead if your printer sags over that width`,
      `half B slides onto half A along y${d.endStop ? ' from the −y side until it meets the end stop' : ''}; the chamfered rail ends help it start`,
    ],
  };
}
