import type { TriangleMesh } from '../../../shared/geometry/mesh';

/** What {@link edgeCheck} found: a closed, consistently oriented 2-manifold has all three counts at 0. */
export interface EdgeReport {
  /** Directed edges whose reverse appears no time (a hole or a T-junction). */
  readonly unmatched: number;
  /** Directed edges that appear more than once (a flipped face or a non-manifold edge). */
  readonly repeated: number;
  /** Triangles with two equal corners. */
  readonly degenerate: number;
  /** Distinct corners after welding by exact float32 coordinates. */
  readonly vertices: number;
}

/**
 * The directed-edge test of a closed, outward-consistent mesh (3MF Core Specification §4.1 via
 * REFERENCES §3.2: "If triangle ABC and triangle DEF share the AB/DE edge, then A = E and B = D"):
 * corners are welded by their exact float32 bits, and every directed edge must appear once with its
 * reverse once.
 */
export function edgeCheck(mesh: TriangleMesh): EdgeReport {
  const ids = new Map<string, number>();
  const bits = new Uint32Array(mesh.positions.buffer, mesh.positions.byteOffset, mesh.positions.length);
  const id = (i: number) => {
    const key = `${bits[i]},${bits[i + 1]},${bits[i + 2]}`;
    let v = ids.get(key);
    if (v === undefined) ids.set(key, (v = ids.size));
    return v;
  };
  const edges = new Map<string, number>();
  let degenerate = 0;
  for (let t = 0; t < mesh.positions.length; t += 9) {
    const c = [id(t), id(t + 3), id(t + 6)];
    if (c[0] === c[1] || c[1] === c[2] || c[0] === c[2]) degenerate++;
    for (let k = 0; k < 3; k++) {
      const key = `${c[k]}>${c[(k + 1) % 3]}`;
      edges.set(key, (edges.get(key) ?? 0) + 1);
    }
  }
  let unmatched = 0;
  let repeated = 0;
  for (const [key, count] of edges) {
    if (count > 1) repeated += count - 1;
    const [a, b] = key.split('>');
    if (!edges.has(`${b}>${a}`)) unmatched += count;
  }
  return { unmatched, repeated, degenerate, vertices: ids.size };
}

/** Welds a soup by exact float32 coordinates: shared corner list and triangle indices (for manifold-3d). */
export function weld(mesh: TriangleMesh): { vertProperties: Float32Array; triVerts: Uint32Array } {
  const ids = new Map<string, number>();
  const verts: number[] = [];
  const bits = new Uint32Array(mesh.positions.buffer, mesh.positions.byteOffset, mesh.positions.length);
  const triVerts = new Uint32Array(mesh.positions.length / 3);
  for (let i = 0; i < mesh.positions.length; i += 3) {
    const key = `${bits[i]},${bits[i + 1]},${bits[i + 2]}`;
    let v = ids.get(key);
    if (v === undefined) {
      v = ids.size;
      ids.set(key, v);
      verts.push(mesh.positions[i]!, mesh.positions[i + 1]!, mesh.positions[i + 2]!);
    }
    triVerts[i / 3] = v;
  }
  return { vertProperties: new Float32Array(verts), triVerts };
}
