import type { TriangleMesh } from '../../../../shared/geometry/mesh';

/** An axis-aligned box on the cut face, mm. */
export interface Footprint2 {
  readonly minX: number;
  readonly maxX: number;
  readonly minY: number;
  readonly maxY: number;
}

/**
 * The box each feature of a multi-feature file covers on the face: every corner goes to the nearest
 * position along x (rails and slots are spaced along x and run along y), and each group's x and y extents
 * are taken: the widest outline of the feature (a rail's top, a slot's roof).
 *
 * @param mesh - a rail or slot-cutter file, mm
 * @param positions - the feature centres [x, y] from the manifest
 * @returns one box per position, same order
 */
export function footprintsAt(mesh: TriangleMesh, positions: ReadonlyArray<readonly [number, number]>): Footprint2[] {
  const boxes = positions.map(() => ({ minX: Infinity, maxX: -Infinity, minY: Infinity, maxY: -Infinity }));
  if (boxes.length === 0) return [];
  const p = mesh.positions;
  for (let i = 0; i < p.length; i += 3) {
    const x = p[i]!;
    const y = p[i + 1]!;
    let best = 0;
    for (let j = 1; j < positions.length; j++) {
      if (Math.abs(positions[j]![0] - x) < Math.abs(positions[best]![0] - x)) best = j;
    }
    const b = boxes[best]!;
    b.minX = Math.min(b.minX, x);
    b.maxX = Math.max(b.maxX, x);
    b.minY = Math.min(b.minY, y);
    b.maxY = Math.max(b.maxY, y);
  }
  return boxes;
}
