import type { ManifoldToplevel } from 'manifold-3d';
import { couponGrades } from '../geometry/coupon/coupon-grades';
import { COUPON_LABEL_BAND_MM } from '../geometry/coupon/coupon-plate-layout';
import { gradedBlock } from '../geometry/coupon/graded-block';
import { dovetailRail } from '../geometry/dovetail-rail';
import { geom3ToMesh, manifoldToMesh, type TriangleMesh } from '../geometry/mesh';
import { dovetailSection } from '../geometry/section/dovetail-section';
import { offsetConvexPolygon } from '../geometry/section/offset-convex-polygon';
import { degreesToRadians, type Vec3 } from '../geometry/units';
import type { ResolvedDovetailCouponRequest } from '../schemas/coupon-request';
import type { CouponManifest, CouponPocket } from './coupon-manifest';
import { describePart } from './describe-part';

/** Length of the test slots along y, mm: long enough to feel the fit, short enough to print fast. */
export const COUPON_SLOT_LENGTH_MM = 20;
/** Wall between slots, roof over them and base under the test rail, mm (common practice). */
const WALL_MM = 2.4;
const BASE_MM = 2;

/**
 * A dovetail fit-test coupon: a block with one slot per graded clearance (open at the back, numbered on a
 * band in front), printed slots up, and one short rail on a small base plate to slide into each slot.
 *
 * @param wasm - the loaded manifold-3d module
 * @param request - a resolved dovetail coupon request
 * @returns the manifest and the meshes by file name
 */
export function dovetailCoupon(
  wasm: ManifoldToplevel,
  request: ResolvedDovetailCouponRequest,
): { manifest: CouponManifest; meshes: Map<string, TriangleMesh> } {
  const d = request.dovetail;
  const section = { rootWidth: d.rootWidth, height: d.height, flankAngle: degreesToRadians(d.angleDeg) };
  const trapezoid = dovetailSection(section);
  const grades = couponGrades(request.clearanceFrom, request.clearanceTo, request.clearanceStep);
  const cMax = grades[grades.length - 1]!;
  const topWidth = trapezoid[2]![0] - trapezoid[3]![0];
  const pitch = topWidth + 2 * cMax + WALL_MM;
  const width = grades.length * pitch + WALL_MM;
  const height = d.height + cMax + WALL_MM;
  const [yBack, yFront] = [COUPON_SLOT_LENGTH_MM / 2, -COUPON_SLOT_LENGTH_MM / 2];
  const xs = grades.map((_, i) => -width / 2 + WALL_MM + pitch * i + (pitch - WALL_MM) / 2);
  // Slots open upward: the rail's base line (v = 0) lies on the top face, the section flipped (z = top − v).
  const cutters = grades.map((c, i) => {
    const ring = offsetConvexPolygon(trapezoid, [1, c, c, c]);
    const at = (y: number) => ring.map(([u, v]) => [xs[i]! + u, y, height - v] as Vec3);
    return [...at(yFront), ...at(yBack + 1)];
  });
  const marks = grades.map((_, i) => String(i + 1));
  const block = gradedBlock(wasm, {
    min: [-width / 2, yFront - COUPON_LABEL_BAND_MM, 0],
    max: [width / 2, yBack, height],
    cutters,
    marks: marks.map((text, i) => ({ text, centre: [xs[i]!, yFront - COUPON_LABEL_BAND_MM / 2] as const })),
  });
  const rail = railOnBase(wasm, section, d.chamfer ?? 0.5);
  const meshes = new Map<string, TriangleMesh>([
    ['slot-block.stl', block],
    ['rail.stl', rail],
  ]);
  const pockets: CouponPocket[] = grades.map((c, i) => ({
    mark: marks[i]!,
    clearancePerSide: c,
    position: [xs[i]!, 0],
  }));
  return {
    manifest: {
      units: 'mm',
      kind: 'fit-test-coupon',
      request,
      clearanceRange: { from: request.clearanceFrom, to: request.clearanceTo, step: request.clearanceStep },
      pockets,
      parts: [
        describePart(
          'slot-block.stl',
          'slot-block',
          1,
          block,
          `block ${round(width)} × ${COUPON_SLOT_LENGTH_MM + COUPON_LABEL_BAND_MM} mm, slots up`,
        ),
        describePart('rail.stl', 'rail', 1, rail, 'one rail on a base plate; slide it into each slot from the back'),
      ],
      warnings: width > 100 ? [`the slot block is ${round(width)} mm wide; take fewer grades for a smaller block`] : [],
      printNotes: [
        'Print the block with its slots facing up and the rail standing on its base plate.',
        'Do not scale anything in the slicer: the slots are graded in hundredths of a millimetre.',
        'Slide the rail into each slot from the open back end; the numbered band in front is the end stop.',
        'Judge each slot by hand: the rail does not go in; goes in only with force (press); goes in with light pressure and no play (snug, for gluing); slides freely (slide); or rattles (too loose).',
      ],
    },
    meshes,
  };
}

const round = (v: number) => Math.round(v * 10) / 10;

// The rail is a convex loft, so its hull is itself; one union joins it to a base plate it can stand on.
function railOnBase(
  wasm: ManifoldToplevel,
  section: Parameters<typeof dovetailSection>[0],
  chamfer: number,
): TriangleMesh {
  const length = COUPON_SLOT_LENGTH_MM - 2;
  const rail = geom3ToMesh(dovetailRail({ ...section, x: 0, y0: -length / 2, y1: length / 2, chamfer }));
  const points: Array<[number, number, number]> = [];
  for (let i = 0; i < rail.positions.length; i += 3)
    points.push([rail.positions[i]!, rail.positions[i + 1]!, rail.positions[i + 2]!]);
  const baseWidth = section.rootWidth + 2 * section.height + 8;
  const { Manifold } = wasm;
  const hull = Manifold.hull(points);
  const cube = Manifold.cube([baseWidth, length, BASE_MM]);
  const base = cube.translate([-baseWidth / 2, -length / 2, -BASE_MM]);
  const joined = Manifold.union([base, hull]);
  const lifted = joined.translate([0, 0, BASE_MM]);
  try {
    return manifoldToMesh(lifted.getMesh());
  } finally {
    [hull, cube, base, joined, lifted].forEach((m) => m.delete());
  }
}
