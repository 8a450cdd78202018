import type { Face } from '../../schemas/face';
import { polygonRing } from './polygon-ring';
import { ringSignedDistance } from './ring-signed-distance';

/**
 * The distance from a point to the nearest edge of the cut face, in mm, whether the point is
 * inside or outside (use `pointInFace` for the side). Zero on the edge.
 *
 * @param face - the cut face (mm)
 * @param p - the point [x, y] in mm
 * @returns the distance in mm, never negative
 * @example
 * distanceToFaceEdge({ shape: 'rect', width: 20, height: 10 }, [0, 0]); // 5
 * distanceToFaceEdge({ shape: 'circle', diameter: 10 }, [0, 8]);         // 3
 */
export function distanceToFaceEdge(face: Face, p: [number, number]): number {
  const [x, y] = p;
  if (face.shape === 'circle') return Math.abs(Math.sqrt(x * x + y * y) - face.diameter / 2);
  if (face.shape === 'polygon') return Math.abs(ringSignedDistance(polygonRing(face.points), x, y));
  const ax = Math.abs(x) - face.width / 2;
  const ay = Math.abs(y) - face.height / 2;
  if (ax <= 0 && ay <= 0) return Math.min(-ax, -ay);
  const ox = Math.max(0, ax);
  const oy = Math.max(0, ay);
  return Math.sqrt(ox * ox + oy * oy);
}
