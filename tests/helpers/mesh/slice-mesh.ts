import type { TriangleMesh } from '../../../shared/geometry/mesh';

export type Axis = 0 | 1 | 2;

/**
 * Slices a mesh with the plane `axis = value` and returns the crossing points projected on the other two
 * axes (in ascending axis order: x-slice → [y, z], y-slice → [x, z], z-slice → [x, y]). Each triangle that
 * straddles the plane adds the two points where its edges cross it. Choose `value` away from any corner.
 * Takes a kit file's float32 mesh or a solid's unsnapped float64 triangles (`solidTriangles`).
 */
export function sliceMesh(
  mesh: TriangleMesh | { readonly positions: Float64Array },
  axis: Axis,
  value: number,
): Array<[number, number]> {
  const [u, v] = ([0, 1, 2] as const).filter((a) => a !== axis) as [Axis, Axis];
  const p = mesh.positions;
  const out: Array<[number, number]> = [];
  for (let t = 0; t < p.length; t += 9) {
    for (let k = 0; k < 3; k++) {
      const a = t + 3 * k;
      const b = t + 3 * ((k + 1) % 3);
      const da = p[a + axis]! - value;
      const db = p[b + axis]! - value;
      if ((da < 0 && db > 0) || (da > 0 && db < 0)) {
        const s = da / (da - db);
        out.push([p[a + u]! + s * (p[b + u]! - p[a + u]!), p[a + v]! + s * (p[b + v]! - p[a + v]!)]);
      }
    }
  }
  return out;
}

/** The support distance of a point set in a direction: max over points of p · dir (dir a unit vector). */
export function support(points: ReadonlyArray<readonly [number, number]>, dir: readonly [number, number]): number {
  let best = -Infinity;
  for (const [x, y] of points) best = Math.max(best, x * dir[0] + y * dir[1]);
  return best;
}

/**
 * The points of a slice inside one layout footprint (grown by `slack`) about `centre`, moved so the centre is
 * the origin: picks one pocket's section out of a slice through a whole cutter file.
 */
export function near(
  points: ReadonlyArray<readonly [number, number]>,
  centre: readonly [number, number],
  footprint: { kind: 'rect'; width: number; height: number } | { kind: 'circle'; diameter: number },
  slack: number,
): Array<[number, number]> {
  const inside = (dx: number, dy: number) =>
    footprint.kind === 'circle'
      ? Math.hypot(dx, dy) <= footprint.diameter / 2 + slack
      : Math.abs(dx) <= footprint.width / 2 + slack && Math.abs(dy) <= footprint.height / 2 + slack;
  return points
    .map(([x, y]) => [x - centre[0], y - centre[1]] as [number, number])
    .filter(([dx, dy]) => inside(dx, dy));
}
