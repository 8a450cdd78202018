import jscad from '@jscad/modeling';
import type { Geom3 } from '@jscad/modeling/src/geometries/types';
import type { TriangleMesh } from './triangle-mesh';

const { geom3 } = jscad.geometries;
const { measureEpsilon } = jscad.measurements;
// The package's .d.ts re-exports a default that snap.d.ts never declares: type the function by hand.
const snap = jscad.modifiers.snap as unknown as (geometry: Geom3) => Geom3;

type V = readonly number[];

/**
 * Converts a JSCAD solid to a {@link TriangleMesh} with the same triangles, in the same order and
 * orientation, as @jscad/stl-serializer 2.1 writes for it, so the fast STL writers agree with the reference
 * writer. The serializer first runs `generalize({ snap: true, triangulate: true })`; this does the same:
 *
 * 1. snap every corner to JSCAD's grid (1e-5 × the mean bounding-box side) with JSCAD's own `snap`,
 *    which also drops repeated corners and zero-area faces;
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
  const epsilon = measureEpsilon(solid);
  const polygons = geom3.toPolygons(snap(solid));
  let count = 0;
  for (const p of polygons) count += p.vertices.length === 3 ? 1 : p.vertices.length === 4 ? 2 : p.vertices.length;
  const positions = new Float32Array(count * 9);
  const normals = new Float32Array(count * 3);
  let t = 0;
  const emit = (a: V, b: V, c: V): void => {
    writeTriangle(positions, normals, t++, a, b, c);
  };
  for (const { vertices: vs } of polygons) {
    const n = vs.length;
    if (n === 3) emit(vs[0]!, vs[1]!, vs[2]!);
    else if (n === 4) {
      emit(vs[0]!, vs[1]!, vs[2]!);
      emit(vs[0]!, vs[2]!, vs[3]!);
    } else {
      const mid = snappedMean(vs, epsilon);
      for (let i = 0; i < n; i++) emit(mid, vs[i]!, vs[(i + 1) % n]!);
    }
  }
  return { positions, normals };
}

/** The polygon's mean corner, summed in order and snapped exactly as JSCAD's triangulation does. */
function snappedMean(vs: readonly V[], epsilon: number): V {
  let x = 0;
  let y = 0;
  let z = 0;
  for (const v of vs) {
    x += v[0]!;
    y += v[1]!;
    z += v[2]!;
  }
  const n = vs.length;
  const s = (value: number) => Math.round(value / n / epsilon) * epsilon + 0;
  return [s(x), s(y), s(z)];
}

function writeTriangle(positions: Float32Array, normals: Float32Array, t: number, a: V, b: V, c: V): void {
  const [ax, ay, az] = a as [number, number, number];
  const [bx, by, bz] = b as [number, number, number];
  const [cx, cy, cz] = c as [number, number, number];
  const ux = bx - ax;
  const uy = by - ay;
  const uz = bz - az;
  const vx = cx - ax;
  const vy = cy - ay;
  const vz = cz - az;
  const nx = uy * vz - uz * vy;
  const ny = uz * vx - ux * vz;
  const nz = ux * vy - uy * vx;
  // Same operation order as JSCAD's vec3.normalize: multiply by the reciprocal length.
  let len = nx * nx + ny * ny + nz * nz;
  if (len > 0) len = 1 / Math.sqrt(len);
  const o = t * 3;
  normals[o] = nx * len;
  normals[o + 1] = ny * len;
  normals[o + 2] = nz * len;
  const p = t * 9;
  positions[p] = ax;
  positions[p + 1] = ay;
  positions[p + 2] = az;
  positions[p + 3] = bx;
  positions[p + 4] = by;
  positions[p + 5] = bz;
  positions[p + 6] = cx;
  positions[p + 7] = cy;
  positions[p + 8] = cz;
}
