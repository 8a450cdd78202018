import { resolveClearance } from '../fit';
import { dovetailRail } from '../geometry/dovetail-rail';
import { dovetailSlotCutter } from '../geometry/dovetail-slot-cutter';
import { placeRails, type RailPlacement } from '../geometry/place-rails';
import type { DovetailSectionParams } from '../geometry/section/dovetail-section';
import { mergeSolids } from '../geometry/solid/merge-solids';
import { radians } from '../geometry/units';
import type { DovetailOptions } from '../schemas/kit-dovetail-options';
import type { ResolvedDovetailKitRequest } from '../schemas/kit-request';
import type { KitPartPlan, KitPlan } from './kit-part-plan';

const round = (mm: number) => Math.round(mm * 1000) / 1000;
const plural = (n: number, word: string) => `${n} ${word}${n === 1 ? '' : 's'}`;

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
  const { process, material, fit: fitClass, materialTuning, calibrationOffset, calibrationSource, clearance } = request;
  const fit = resolveClearance({
    process,
    material,
    fit: fitClass,
    materialTuning,
    calibrationOffset,
    calibrationSource,
    clearance,
  });
  const c = fit.clearancePerSide;
  const section: DovetailSectionParams = {
    rootWidth: d.rootWidth,
    height: d.height,
    flankAngle: radians(Math.atan(1 / d.slope)),
  };
  const rails = placeRails({ ...d, ...section, face: request.face, clearance: c });
  return {
    parts: [railPart(section, rails, d.chamfer), slotPart(section, rails, c, d.endStop)],
    clearancePerSide: c,
    derivation: fit.derivation,
    steps: fit.steps,
    warnings: fit.warnings,
    derived: {
      railCount: rails.length,
      shortestRailLength: round(Math.min(...rails.map((r) => r.y1 - r.y0))),
      topWidth: round(topWidthOf(d)),
      flankAngleDeg: round(d.angleDeg),
      slope: round(d.slope),
      pitch: rails.length > 1 ? round(rails[1]!.x - rails[0]!.x) : 0,
    },
    printNotes: dovetailPrintNotes(d, c),
  };
}

function topWidthOf(d: DovetailOptions): number {
  return d.rootWidth + (2 * d.height) / d.slope;
}

function railPart(section: DovetailSectionParams, rails: RailPlacement[], chamfer: number): KitPartPlan {
  const solid = mergeSolids(rails.map((r) => dovetailRail({ ...section, x: r.x, y0: r.y0, y1: r.y1, chamfer })));
  const positions = rails.map((r): [number, number] => [r.x, (r.y0 + r.y1) / 2]);
  const note = `join onto half A (union): ${plural(rails.length, 'rail')} standing on the cut face, in place`;
  return { file: 'rail-A.stl', role: 'rail', half: 'A', quantity: 1, solid, positions, note };
}

function slotPart(
  section: DovetailSectionParams,
  rails: RailPlacement[],
  clearance: number,
  endStop: boolean,
): KitPartPlan {
  const solid = mergeSolids(
    rails.map((r) => dovetailSlotCutter({ ...section, clearance, x: r.x, y0: r.slotY0, y1: r.slotY1 })),
  );
  const positions = rails.map((r): [number, number] => [r.x, (r.slotY0 + r.slotY1) / 2]);
  const note = `subtract from half B: ${plural(rails.length, 'slot')}, open at ${endStop ? 'the −y end' : 'both ends'}`;
  return { file: 'slot-cutter-B.stl', role: 'slot-cutter', half: 'B', quantity: 1, solid, positions, note };
}

function dovetailPrintNotes(d: DovetailOptions, clearance: number): string[] {
  return [
    `print half A with its cut face up so the rails grow straight up: their flanks lean out ${round(d.angleDeg)}° from the vertical, which prints without support`,
    `half B: with its cut face down, each slot's roof is a bridge ${round(topWidthOf(d) + 2 * clearance)} mm wide; print it on its side instead if your printer sags over that width`,
    `half B slides onto half A along y${d.endStop ? ' from the −y side until it meets the end stop' : ''}; the chamfered rail ends help it start`,
  ];
}
