/** A point in the illustration's model space, mm-like units: x right, y back, z up. */
export type P3 = readonly [number, number, number];

/** Isometric projection seen from the front right, above: screen x grows with x + y, screen y (down) with x − y − z. */
export function iso([x, y, z]: P3): string {
  return `${((x + y) * 0.866).toFixed(2)},${((x - y) * 0.5 - z).toFixed(2)}`;
}

/** An SVG points list for a polygon in model space. */
export const poly = (...points: P3[]) => points.map(iso).join(' ');

/** The three faces of a box the viewer sees: top, front (−y) and right (+x). */
export function boxFaces(x0: number, x1: number, y0: number, y1: number, z0: number, z1: number) {
  return {
    top: poly([x0, y0, z1], [x1, y0, z1], [x1, y1, z1], [x0, y1, z1]),
    front: poly([x0, y0, z0], [x1, y0, z0], [x1, y0, z1], [x0, y0, z1]),
    right: poly([x1, y0, z0], [x1, y1, z0], [x1, y1, z1], [x1, y0, z1]),
  };
}
