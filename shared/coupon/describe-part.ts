import { meshBounds, meshVolume, triangleCount, type TriangleMesh } from '../geometry/mesh';
import type { CouponManifest } from './coupon-manifest';

const r3 = (v: number) => Math.round(v * 1000) / 1000 + 0;

/** A coupon file's manifest entry, measured on its mesh (volume mm³ and bbox mm to 0.001). */
export function describePart(
  file: string,
  role: CouponManifest['parts'][number]['role'],
  quantity: number,
  mesh: TriangleMesh,
  note: string,
): CouponManifest['parts'][number] {
  const { min, max } = meshBounds(mesh);
  return {
    file,
    role,
    quantity,
    triangles: triangleCount(mesh),
    volumeMm3: r3(meshVolume(mesh)),
    bbox: { min: [r3(min[0]), r3(min[1]), r3(min[2])], max: [r3(max[0]), r3(max[1]), r3(max[2])] },
    note,
  };
}
