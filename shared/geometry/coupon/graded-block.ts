import type { ManifoldToplevel } from 'manifold-3d';
import { manifoldToMesh } from '../mesh/manifold-to-mesh';
import type { TriangleMesh } from '../mesh/triangle-mesh';
import type { Vec2, Vec3 } from '../units';
import { markOutlines } from './mark-outlines';

/** Depth of engraved marks, mm: three 0.2 mm layers (common practice). */
export const MARK_DEPTH_MM = 0.6;
/** How far mark cutters reach above the top face so the subtraction leaves no skin, mm. */
const OVERSHOOT_MM = 1;

/** Parameters of a graded test block, in mm; see {@link gradedBlock}. */
export interface GradedBlockParams {
  /** The block: an axis-aligned box from `min` to `max`. */
  readonly min: Vec3;
  readonly max: Vec3;
  /** Each cutter as the corner points of a convex solid (its hull is cut away). */
  readonly cutters: ReadonlyArray<readonly Vec3[]>;
  /** Marks engraved into the top face (z = max z): text and where its centre goes. */
  readonly marks: ReadonlyArray<{ text: string; centre: Vec2 }>;
}

/**
 * A fit-test block: a box with convex cavities (pockets, slots) and engraved marks on its top face. Built
 * with manifold-3d as ONE union of every cutter and a single subtraction (subtracting one by one grows with
 * the square of their number); the result is a closed 2-manifold without T-junctions.
 *
 * @param wasm - the loaded manifold-3d module (`await Module()`, then `setup()`)
 * @param params - see {@link GradedBlockParams}
 * @returns the block as a triangle mesh
 * @example
 * gradedBlock(wasm, { min: [-20, -10, 0], max: [20, 10, 6], cutters: [pocketCorners], marks: [{ text: '1', centre: [0, -6] }] });
 */
export function gradedBlock(wasm: ManifoldToplevel, params: GradedBlockParams): TriangleMesh {
  const { Manifold, CrossSection } = wasm;
  const [x0, y0, z0] = params.min;
  const [x1, y1, z1] = params.max;
  const owned: Array<{ delete(): void }> = [];
  const keep = <T extends { delete(): void }>(x: T): T => (owned.push(x), x);
  try {
    const block = keep(keep(Manifold.cube([x1 - x0, y1 - y0, z1 - z0])).translate([x0, y0, z0]));
    const cutters = params.cutters.map((points) =>
      keep(Manifold.hull(points.map((p) => [...p] as [number, number, number]))),
    );
    for (const mark of params.marks) {
      const quads = markOutlines(mark.text, mark.centre).map((q) => q.map(([x, y]) => [x, y] as [number, number]));
      const section = keep(new CrossSection(quads, 'NonZero'));
      cutters.push(keep(keep(section.extrude(MARK_DEPTH_MM + OVERSHOOT_MM)).translate([0, 0, z1 - MARK_DEPTH_MM])));
    }
    const result = keep(block.subtract(keep(Manifold.union(cutters))));
    return manifoldToMesh(result.getMesh());
  } finally {
    owned.forEach((x) => x.delete());
  }
}
