import type { Bounds, Point2 } from './footprint';
import { minKeyDistance } from './min-key-distance';

/** Shifts tried for shifted rows, as fractions of half the pitch; the refinement settles the exact one. */
const SHIFT_STEPS = 8;

/**
 * Regular layouts of exactly `count` keys in a box of legal centres: r rows spread from the
 * bottom edge to the top, each row spread from the left edge to the right. The rows hold c keys
 * each, or alternate c and c − 1 (short rows either in the gaps of the long ones, as in a
 * hexagonal packing, or spread edge to edge), starting long or short. Equal rows also come
 * shifted: alternate rows give up a slice (the best of 8, up to half a pitch) at opposite ends,
 * as in a parallelogram (4 keys in a wide box). The same again in columns.
 * These are the shapes the best spread-out layouts of a rectangle are close to (a 2 × 4 grid,
 * 3 + 2 + 3 in a quincunx-like pattern), so a short local refinement finishes them.
 *
 * @param box - legal centres (mm)
 * @param count - keys per layout, 2 or more
 * @returns the layouts (mm), in a fixed order; some may crowd pockets (the caller checks)
 * @example
 * rowLayouts({ minX: -1, minY: -1, maxX: 1, maxY: 1 }, 4)[0]; // the 4 corners among them
 */
export function rowLayouts(box: Bounds, count: number): Point2[][] {
  const out: Point2[][] = [];
  const along = (lo: number, hi: number, n: number, i: number) =>
    n > 1 ? lo + ((hi - lo) * i) / (n - 1) : (lo + hi) / 2;
  for (const transposed of [false, true]) {
    const [xLo, xHi, yLo, yHi] = transposed
      ? [box.minY, box.maxY, box.minX, box.maxX]
      : [box.minX, box.maxX, box.minY, box.maxY];
    for (let rows = 1; rows <= count; rows++) {
      for (const pattern of rowPatterns(count, rows)) {
        const layout = (shift: number): Point2[] => {
          const keys: Point2[] = [];
          pattern.counts.forEach((n, j) => {
            const y = along(yLo, yHi, rows, j);
            // Shifted rows: even rows give up `shift` on the right, odd rows on the left.
            const [lo, hi] = j % 2 === 0 ? [xLo, xHi - shift] : [xLo + shift, xHi];
            for (let i = 0; i < n; i++) {
              // A short row in the gaps sits halfway between the long row's keys.
              const x = pattern.inGaps && n < pattern.long ? along(lo, hi, n + 1, i + 0.5) : along(lo, hi, n, i);
              keys.push(transposed ? [y, x] : [x, y]);
            }
          });
          return keys;
        };
        out.push(layout(0));
        if (rows >= 2 && pattern.long >= 2 && !pattern.inGaps)
          out.push(bestShift(layout, (xHi - xLo) / (pattern.long - 1)));
      }
    }
  }
  return out;
}

/** The shifted-rows layout, of SHIFT_STEPS shifts up to half a pitch, whose closest keys are farthest apart. */
function bestShift(layout: (shift: number) => Point2[], pitch: number): Point2[] {
  let best = layout(pitch / 2);
  let bestGap = minKeyDistance(best);
  for (let s = 1; s < SHIFT_STEPS; s++) {
    const keys = layout((pitch * s) / (2 * SHIFT_STEPS));
    const gap = minKeyDistance(keys);
    if (gap > bestGap) [best, bestGap] = [keys, gap];
  }
  return best;
}

type RowPattern = { counts: number[]; long: number; inGaps: boolean };

/** Ways to split `count` keys into `rows` rows: all equal, or alternating long and short. */
function rowPatterns(count: number, rows: number): RowPattern[] {
  const patterns: RowPattern[] = [];
  if (count % rows === 0)
    patterns.push({ counts: Array<number>(rows).fill(count / rows), long: count / rows, inGaps: false });
  if (rows < 2) return patterns;
  for (const startLong of [true, false]) {
    const longRows = startLong ? Math.ceil(rows / 2) : Math.floor(rows / 2);
    // longRows · c + (rows − longRows) · (c − 1) = count
    const c = (count + rows - longRows) / rows;
    if (!Number.isInteger(c) || c < 2) continue;
    const counts = Array.from({ length: rows }, (_, j) => ((j % 2 === 0) === startLong ? c : c - 1));
    patterns.push({ counts, long: c, inGaps: true });
    if (c - 1 >= 2) patterns.push({ counts, long: c, inGaps: false });
  }
  return patterns;
}
