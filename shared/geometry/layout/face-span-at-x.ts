import type { Face } from '../../schemas/face';

/**
 * Where the line x = const crosses the face: the lowest and highest y of the face on that line,
 * in mm. Dovetail rails run along y, so this is how far a rail at x can reach. For a non-convex
 * polygon the line may cross several times; this is the overall extent, gaps included.
 *
 * @param face - the cut face (mm)
 * @param x - the line's position along x (mm)
 * @returns { minY, maxY } in mm, or null when the line misses the face
 * @example
 * faceSpanAtX({ shape: 'circle', diameter: 10 }, 3); // { minY: -4, maxY: 4 }
 * faceSpanAtX({ shape: 'rect', width: 10, height: 6 }, 7); // null
 */
export function faceSpanAtX(face: Face, x: number): { minY: number; maxY: number } | null {
  if (face.shape === 'rect') {
    return Math.abs(x) <= face.width / 2 ? { minY: -face.height / 2, maxY: face.height / 2 } : null;
  }
  if (face.shape === 'circle') {
    const r = face.diameter / 2;
    if (Math.abs(x) > r) return null;
    const half = Math.sqrt(r * r - x * x);
    return { minY: -half, maxY: half };
  }
  let minY = Infinity;
  let maxY = -Infinity;
  const pts = face.points;
  for (let i = 0, j = pts.length - 1; i < pts.length; j = i++) {
    const [xi, yi] = pts[i]!;
    const [xj, yj] = pts[j]!;
    if (x < Math.min(xi, xj) || x > Math.max(xi, xj)) continue;
    // A vertical edge on the line contributes both ends; any other edge its single crossing.
    const ys = xi === xj ? [yi, yj] : [yj + ((x - xj) * (yi - yj)) / (xi - xj)];
    for (const y of ys) {
      minY = Math.min(minY, y);
      maxY = Math.max(maxY, y);
    }
  }
  return minY <= maxY ? { minY, maxY } : null;
}
