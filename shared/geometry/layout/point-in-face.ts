import type { Face } from '../../schemas/face';
import { polygonRing } from './polygon-ring';
import { ringSignedDistance } from './ring-signed-distance';

/**
 * Whether a point lies on the cut face, edge included.
 *
 * @param face - the cut face (mm)
 * @param p - the point [x, y] in mm
 * @returns true inside or on the edge
 * @example
 * pointInFace({ shape: 'circle', diameter: 10 }, [3, 4]); // true (on the edge)
 */
export function pointInFace(face: Face, p: [number, number]): boolean {
  const [x, y] = p;
  if (face.shape === 'rect') return Math.abs(x) <= face.width / 2 && Math.abs(y) <= face.height / 2;
  if (face.shape === 'circle') return x * x + y * y <= (face.diameter * face.diameter) / 4;
  // 1e-9 mm: a point on a polygon edge counts as inside, whatever the crossing test says.
  return ringSignedDistance(polygonRing(face.points), x, y) >= -1e-9;
}
