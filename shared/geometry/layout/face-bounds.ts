import type { Face } from '../../schemas/face';
import type { Bounds } from './footprint';

/**
 * The axis-aligned bounding box of a cut face, in mm, in the face plane (z = 0).
 * Rect and circle faces are centred on the origin; a polygon's box is that of its points.
 *
 * @param face - the cut face (mm)
 * @returns { minX, minY, maxX, maxY } in mm
 * @example
 * faceBounds({ shape: 'rect', width: 80, height: 60 }); // { minX: -40, minY: -30, maxX: 40, maxY: 30 }
 */
export function faceBounds(face: Face): Bounds {
  if (face.shape === 'rect') {
    return { minX: -face.width / 2, minY: -face.height / 2, maxX: face.width / 2, maxY: face.height / 2 };
  }
  if (face.shape === 'circle') {
    const r = face.diameter / 2;
    return { minX: -r, minY: -r, maxX: r, maxY: r };
  }
  let minX = Infinity;
  let minY = Infinity;
  let maxX = -Infinity;
  let maxY = -Infinity;
  for (const [x, y] of face.points) {
    minX = Math.min(minX, x);
    minY = Math.min(minY, y);
    maxX = Math.max(maxX, x);
    maxY = Math.max(maxY, y);
  }
  return { minX, minY, maxX, maxY };
}
