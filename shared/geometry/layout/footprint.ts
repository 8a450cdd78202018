/**
 * The outline of one pocket in the face plane, in mm: the key's cross-section grown by the clearance
 * per side (and any entry chamfer), centred on the key position and axis-aligned.
 *
 * @example
 * const pocket: Footprint = { kind: 'rect', width: 10.4, height: 10.4 }; // 10 mm key, 0.2 mm per side
 * const round: Footprint = { kind: 'circle', diameter: 8.3 };
 */
export type Footprint = { kind: 'rect'; width: number; height: number } | { kind: 'circle'; diameter: number };

/** An axis-aligned box in the face plane, in mm. */
export type Bounds = { minX: number; minY: number; maxX: number; maxY: number };

/** A point [x, y] in the face plane, in mm. */
export type Point2 = [number, number];
