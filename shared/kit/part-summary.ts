import type { TriangleMesh } from '../geometry/mesh';
import { meshBounds, meshVolume, triangleCount } from '../geometry/mesh';
import type { KitPart } from './kit-manifest';
import type { KitPartPlan } from './kit-part-plan';

const r3 = (v: number) => Math.round(v * 1000) / 1000 + 0;

/**
 * The manifest entry of one kit file, measured on the mesh that goes into it: triangle count, enclosed
 * volume (mm³, 0.001 steps) and bounding box (mm, 0.001 steps).
 *
 * @param plan - the file's plan (name, role, half, quantity, positions, note)
 * @param mesh - the file's mesh
 * @returns the part as the manifest lists it
 * @example
 * partSummary(plan, geom3ToMesh(plan.solid)).triangles; // 28 for a chamfered square key
 */
export function partSummary(plan: KitPartPlan, mesh: TriangleMesh): KitPart {
  const { min, max } = meshBounds(mesh);
  return {
    file: plan.file,
    role: plan.role,
    ...(plan.half ? { half: plan.half } : {}),
    quantity: plan.quantity,
    triangles: triangleCount(mesh),
    volumeMm3: r3(meshVolume(mesh)),
    bbox: { min: [r3(min[0]), r3(min[1]), r3(min[2])], max: [r3(max[0]), r3(max[1]), r3(max[2])] },
    // Positions exactly as the solids were built from them, so a reader can find each pocket to the micron.
    ...(plan.positions ? { positions: plan.positions.map(([x, y]) => [x, y] as [number, number]) } : {}),
    note: plan.note,
  };
}
