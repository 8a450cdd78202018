import type { ManifoldToplevel } from 'manifold-3d';
import { keyScaleForClearance } from '../fit';
import { couponGrades } from '../geometry/coupon/coupon-grades';
import { couponPlateLayout } from '../geometry/coupon/coupon-plate-layout';
import { gradedBlock } from '../geometry/coupon/graded-block';
import { keyOnBed } from '../geometry/key-on-bed';
import { keyPin } from '../geometry/key-pin';
import { geom3ToMesh, type TriangleMesh } from '../geometry/mesh';
import { offsetConvexPolygon } from '../geometry/section/offset-convex-polygon';
import { pocketSection } from '../geometry/section/pocket-section';
import type { ResolvedKeyCouponRequest } from '../schemas/coupon-request';
import type { CouponManifest, CouponPocket } from './coupon-manifest';
import { describePart } from './describe-part';

/** Deepest coupon pocket, mm: with a 1.2 mm floor the plate stays 6 mm thick (issue 7). */
export const COUPON_POCKET_DEPTH_MM = 4.8;
/** Solid floor under each pocket, mm: 6 layers of 0.2 mm (common practice). */
export const COUPON_FLOOR_MM = 1.2;

const bounds = (ring: ReadonlyArray<readonly [number, number]>) => ({
  w: Math.max(...ring.map((p) => p[0])) - Math.min(...ring.map((p) => p[0])),
  h: Math.max(...ring.map((p) => p[1])) - Math.min(...ring.map((p) => p[1])),
});

/**
 * A key fit-test coupon: a plate with one pocket per graded clearance, each numbered 1, 2, … on the plate,
 * and the keys to try in them. `clearance` strategy: pockets grown by each grade, keys at nominal size (one
 * file, quantity = pockets). `scale` strategy: pockets at nominal size and one scaled-down key per pocket.
 *
 * @param wasm - the loaded manifold-3d module (the plate needs one boolean)
 * @param request - a resolved key coupon request
 * @returns the manifest and the meshes by file name
 */
export function keyCoupon(
  wasm: ManifoldToplevel,
  request: ResolvedKeyCouponRequest,
): { manifest: CouponManifest; meshes: Map<string, TriangleMesh> } {
  const k = request.key;
  const sectionParams = { shape: k.shape, width: k.width, length: k.length, flat: k.flat, chordTolerance: 0.02 };
  // Keys from keySection (a round one inscribed in its circle), pockets from pocketSection (a round one
  // circumscribing it, flats at r + each grade), as in a kit, so each pocket leaves at least its grade.
  const nominal = pocketSection(sectionParams);
  const grades = couponGrades(request.clearanceFrom, request.clearanceTo, request.clearanceStep);
  const byScale = k.strategy === 'scale';
  const pocketDepth = Math.min(k.depth, COUPON_POCKET_DEPTH_MM);
  const thickness = pocketDepth + COUPON_FLOOR_MM;
  const keyLength = 2 * pocketDepth - k.endGap;
  const chamfer = Math.min(k.chamfer ?? 0.4, keyLength / 4, k.width / 4);
  const outlines = grades.map((c) => (byScale ? nominal : offsetConvexPolygon(nominal, c)));
  const cell = bounds(outlines[outlines.length - 1]!);
  const layout = couponPlateLayout(grades.length, cell.w, cell.h);
  const marks = grades.map((_, i) => String(i + 1));
  // Each pocket is a prism of its outline from the pocket floor to 1 mm above the top face.
  const cutters = outlines.map((outline, i) => {
    const [cx, cy] = layout.pockets[i]!;
    const ring = outline.map(([x, y]) => [x + cx, y + cy] as const);
    return [
      ...ring.map(([x, y]) => [x, y, thickness - pocketDepth] as const),
      ...ring.map(([x, y]) => [x, y, thickness + 1] as const),
    ];
  });
  const plate = gradedBlock(wasm, {
    min: [-layout.width / 2, -layout.depth / 2, 0],
    max: [layout.width / 2, layout.depth / 2, thickness],
    cutters,
    marks: marks.map((text, i) => ({ text, centre: layout.labels[i]! })),
  });
  const meshes = new Map<string, TriangleMesh>([['coupon-plate.stl', plate]]);
  const parts = [
    describePart(
      'coupon-plate.stl',
      'coupon-plate',
      1,
      plate,
      `plate ${layout.width} × ${layout.depth} × ${thickness} mm, pockets up`,
    ),
  ];
  const pockets: CouponPocket[] = grades.map((c, i) => ({
    mark: marks[i]!,
    clearancePerSide: c,
    position: layout.pockets[i]! as [number, number],
  }));
  if (byScale) {
    grades.forEach((c, i) => {
      const scale = keyScaleForClearance(k.width, c);
      const file = `key-${marks[i]}.stl`;
      const mesh = geom3ToMesh(keyOnBed(keyPin({ ...sectionParams, keyLength, chamfer, scale })));
      meshes.set(file, mesh);
      parts.push(
        describePart(file, 'key', 1, mesh, `key for pocket ${marks[i]}, scaled to ${(scale * 100).toFixed(2)} %`),
      );
      Object.assign(pockets[i]!, { keyFile: file, keyScale: scale });
    });
  } else {
    const mesh = geom3ToMesh(keyOnBed(keyPin({ ...sectionParams, keyLength, chamfer })));
    meshes.set('key.stl', mesh);
    parts.push(describePart('key.stl', 'key', grades.length, mesh, `print ${grades.length}, one for each pocket`));
  }
  const warnings =
    k.depth > pocketDepth
      ? [
          `coupon pockets are ${pocketDepth} mm deep (not ${k.depth} mm) so the plate prints quickly; the fit across the key does not depend on depth`,
        ]
      : [];
  // A scaled key shrinks towards its centre, so its flat (nearer the centre than its circle) gains less.
  if (byScale && k.shape === 'round' && k.flat > 0) {
    const share = Math.round(((k.width / 2 - k.flat) / (k.width / 2)) * 1000) / 10;
    warnings.push(
      `each scaled key leaves its pocket's clearance around its circle but only ${share} % of it at its flat (${k.flat} mm deep on a ${k.width} mm key)`,
    );
  }
  return {
    manifest: {
      units: 'mm',
      kind: 'fit-test-coupon',
      request,
      clearanceRange: { from: request.clearanceFrom, to: request.clearanceTo, step: request.clearanceStep },
      pockets,
      parts,
      warnings,
      printNotes: keyCouponNotes(byScale),
    },
    meshes,
  };
}

function keyCouponNotes(byScale: boolean): string[] {
  return [
    'Print the plate flat on the bed, pockets facing up; print the keys lying down as they come in the files.',
    'Do not scale anything in the slicer: the pockets are graded in hundredths of a millimetre.',
    byScale
      ? 'Each key is marked by its file name (key-1.stl goes in pocket 1, and so on); keep them apart after printing.'
      : 'Every key is the same nominal size; try one key in each pocket.',
    'Judge each pocket by hand: the key does not go in; goes in only with force (a press fit); goes in with light pressure and no play (snug, for gluing); slides in and out freely (slide); or wobbles (too loose).',
  ];
}
