import type { Footprint } from './footprint';

/**
 * The wall between two equal pockets whose centres are (dx, dy) apart, in mm.
 * Circles: centre distance minus the diameter. Axis-aligned rectangles: the exact distance between
 * the two outlines. Overlapping pockets give a negative number (how far they overlap).
 *
 * @param footprint - the pocket outline shared by both keys (mm)
 * @param dx - offset between the centres along x (mm)
 * @param dy - offset between the centres along y (mm)
 * @returns the gap in mm; negative when the pockets overlap
 * @example
 * pocketGap({ kind: 'rect', width: 10, height: 10 }, 13, 0); // 3
 * pocketGap({ kind: 'circle', diameter: 8 }, 6, 8);           // 2
 */
export function pocketGap(footprint: Footprint, dx: number, dy: number): number {
  if (footprint.kind === 'circle') return Math.sqrt(dx * dx + dy * dy) - footprint.diameter;
  const gx = Math.abs(dx) - footprint.width;
  const gy = Math.abs(dy) - footprint.height;
  // Overlapping on both axes: the shallower overlap is how far they would have to move apart.
  if (gx < 0 && gy < 0) return Math.max(gx, gy);
  const ox = Math.max(0, gx);
  const oy = Math.max(0, gy);
  return Math.sqrt(ox * ox + oy * oy);
}
