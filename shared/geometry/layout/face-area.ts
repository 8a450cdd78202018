import type { Face } from '../../schemas/face';

/**
 * The area of a cut face, in mm². Polygons by the shoelace formula, so either winding gives the
 * same positive area (a self-crossing outline gives a meaningless number: validate it first).
 *
 * @param face - the cut face (mm)
 * @returns the area in mm²
 * @example
 * faceArea({ shape: 'circle', diameter: 20 }); // 314.159…
 */
export function faceArea(face: Face): number {
  if (face.shape === 'rect') return face.width * face.height;
  if (face.shape === 'circle') return (Math.PI * face.diameter * face.diameter) / 4;
  const pts = face.points;
  let twice = 0;
  for (let i = 0, j = pts.length - 1; i < pts.length; j = i++) {
    const [xi, yi] = pts[i]!;
    const [xj, yj] = pts[j]!;
    twice += xj * yi - xi * yj;
  }
  return Math.abs(twice) / 2;
}
