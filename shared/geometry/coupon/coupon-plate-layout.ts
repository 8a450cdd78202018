import type { Vec2 } from '../units';

/** Wall between pockets and around the plate, mm: 5 perimeters at a 0.4 mm nozzle (common practice). */
export const COUPON_WALL_MM = 2;
/** Band below each pocket that carries its engraved number, mm. */
export const COUPON_LABEL_BAND_MM = 7;
/** Preferred largest plate width, mm, so the coupon prints in minutes (issue 7: about 100 × 40 × 6 mm). */
export const COUPON_MAX_WIDTH_MM = 100;

/** Where everything sits on a coupon plate centred on the origin, in mm. */
export interface CouponPlateLayout {
  readonly width: number;
  readonly depth: number;
  /** Pocket centres, in grade order, left to right then front to back. */
  readonly pockets: Vec2[];
  /** Where each pocket's number is engraved, in the same order. */
  readonly labels: Vec2[];
}

/**
 * Lays out `count` cells of `cellWidth` × `cellDepth` (a pocket's outline, grown by its largest clearance)
 * in rows that stay within {@link COUPON_MAX_WIDTH_MM} where a single cell allows, each with its number
 * engraved in a band in front of it.
 *
 * @param count - number of graded pockets
 * @param cellWidth - largest pocket extent along x, mm
 * @param cellDepth - largest pocket extent along y, mm
 * @returns plate size, pocket centres and label centres
 * @example
 * couponPlateLayout(9, 8.8, 8.8).width; // 9 cells of 10.8 mm won't fit 100 mm: 8 per row → 88.4 mm
 */
export function couponPlateLayout(count: number, cellWidth: number, cellDepth: number): CouponPlateLayout {
  const pitchX = Math.max(cellWidth, 6) + COUPON_WALL_MM;
  const pitchY = cellDepth + COUPON_LABEL_BAND_MM + COUPON_WALL_MM;
  const perRow = Math.max(1, Math.min(count, Math.floor((COUPON_MAX_WIDTH_MM - COUPON_WALL_MM) / pitchX)));
  const rows = Math.ceil(count / perRow);
  const width = perRow * pitchX + COUPON_WALL_MM;
  const depth = rows * pitchY + COUPON_WALL_MM;
  const pockets: Vec2[] = [];
  const labels: Vec2[] = [];
  for (let i = 0; i < count; i++) {
    const column = i % perRow;
    const row = Math.floor(i / perRow);
    const x = -width / 2 + COUPON_WALL_MM + pitchX * column + (pitchX - COUPON_WALL_MM) / 2;
    const cellBottom = -depth / 2 + COUPON_WALL_MM + pitchY * row;
    labels.push([x, cellBottom + COUPON_LABEL_BAND_MM / 2]);
    pockets.push([x, cellBottom + COUPON_LABEL_BAND_MM + cellDepth / 2]);
  }
  return { width, depth, pockets, labels };
}
