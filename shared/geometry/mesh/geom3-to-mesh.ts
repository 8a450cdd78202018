import jscad from '@jscad/modeling';
import type { Geom3 } from '../solid/jscad-types';
import { snapPolygons } from './snap-polygons';
import type { TriangleMesh } from './triangle-mesh';

const { geom3 } = jscad.geometries;

/**
 * Converts a JSCAD solid to a {@link TriangleMesh} with the same triangles, in the same order and
 * orientation, as @jscad/stl-serializer 2.1 writes for it, so the fast STL writers agree with the reference
 * writer. The serializer first runs `generalize({ snap: true, triangulate: true })`; this does the same:
 *
 * 1. snap every corner to JSCAD's grid (1e-5 × the mean bounding-box side), drop repeated corners and
 *    zero-area faces ({@link snapPolygons});
 * 2. triangulate: a triangle stays, a quad splits into (0, 1, 2) and (0, 2, 3), a larger convex polygon
 *    becomes a fan around its snapped mean corner;
 * 3. normal = normalize((b − a) × (c − a)) in double precision, as `poly3.plane` computes it for a triangle.
 *
 * It skips the serializer's T-junction repair: Seamwright's builders make solids without T-junctions (the
 * tests compare every kit file with the reference writer's output), so that step would change nothing.
 *
 * @param solid - a closed JSCAD geom3 without T-junctions
 * @returns triangles and outward normals as float32 arrays
 * @example
 * geom3ToMesh(keyPin({ shape: 'square', width: 10, keyLength: 16 })).positions.length; // 12 triangles × 9
 */
export function geom3ToMesh(solid: Geom3): TriangleMesh {
  const { coords, starts, sizes, epsilon } = snapPolygons(geom3.toPolygons(solid));
  let count = 0;
  for (const n of sizes) count += n === 0 ? 0 : n === 3 ? 1 : n === 4 ? 2 : n;
  const mesh: TriangleMesh = { positions: new Float32Array(count * 9), normals: new Float32Array(count * 3) };
  const mid = new Float64Array(3);
  let t = 0;
  for (let i = 0; i < sizes.length; i++) {
    const n = sizes[i]!;
    const s = starts[i]!;
    if (n === 3) writeTriangle(mesh, t++, coords, s, coords, s + 1, s + 2);
    else if (n === 4) {
      writeTriangle(mesh, t++, coords, s, coords, s + 1, s + 2);
      writeTriangle(mesh, t++, coords, s, coords, s + 2, s + 3);
    } else if (n > 4) {
      snappedMean(coords, s, n, epsilon, mid);
      for (let c = 0; c < n; c++) writeTriangle(mesh, t++, mid, 0, coords, s + c, s + ((c + 1) % n));
    }
  }
  return mesh;
}

/** The polygon's mean corner, summed in order and snapped exactly as JSCAD's triangulation does. */
function snappedMean(coords: Float64Array, start: number, n: number, epsilon: number, out: Float64Array): void {
  for (let k = 0; k < 3; k++) {
    let sum = 0;
    for (let c = 0; c < n; c++) sum += coords[3 * (start + c) + k]!;
    out[k] = Math.round(sum / n / epsilon) * epsilon + 0;
  }
}

/** Triangle t from corner `a` of `first` and corners `b`, `c` of `coords` (indices in corners). */
function writeTriangle(
  mesh: TriangleMesh,
  t: number,
  first: Float64Array,
  a: number,
  coords: Float64Array,
  b: number,
  c: number,
): void {
  const p = mesh.positions;
  const o = 9 * t;
  // Corners in float64 for the normal, then stored as float32; plain locals keep this loop allocation-free.
  const ax = (p[o] = first[3 * a]!);
  const ay = (p[o + 1] = first[3 * a + 1]!);
  const az = (p[o + 2] = first[3 * a + 2]!);
  const ux = (p[o + 3] = coords[3 * b]!) - ax;
  const uy = (p[o + 4] = coords[3 * b + 1]!) - ay;
  const uz = (p[o + 5] = coords[3 * b + 2]!) - az;
  const vx = (p[o + 6] = coords[3 * c]!) - ax;
  const vy = (p[o + 7] = coords[3 * c + 1]!) - ay;
  const vz = (p[o + 8] = coords[3 * c + 2]!) - az;
  const nx = uy * vz - uz * vy;
  const ny = uz * vx - ux * vz;
  const nz = ux * vy - uy * vx;
  // Same operation order as JSCAD's vec3.normalize: multiply by the reciprocal length.
  let len = nx * nx + ny * ny + nz * nz;
  if (len > 0) len = 1 / Math.sqrt(len);
  mesh.normals[3 * t] = nx * len;
  mesh.normals[3 * t + 1] = ny * len;
  mesh.normals[3 * t + 2] = nz * len;
}
