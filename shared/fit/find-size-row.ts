import type { SizeRow } from './iso286-tables';

/**
 * Finds the ISO 286 table row for a nominal size. Ranges are "over A, up to and including B", so 10 mm
 * falls in 6–10 and 10.001 mm in 10–18.
 *
 * @param rows - a table from `iso286-tables.ts`, ranges in ascending order
 * @param sizeMm - nominal size in mm, over 3 up to and including 50
 * @returns the row whose range holds the size
 * @throws RangeError with the numbers when the size is not a finite number inside the table
 * @example
 * findSizeRow(standardToleranceRows, 10).upTo; // 10
 */
export function findSizeRow(rows: readonly SizeRow[], sizeMm: number): SizeRow {
  const row = Number.isFinite(sizeMm) ? rows.find((r) => sizeMm > r.over && sizeMm <= r.upTo) : undefined;
  if (!row) {
    const first = rows[0]?.over ?? 0;
    const last = rows[rows.length - 1]?.upTo ?? 0;
    throw new RangeError(
      `size ${sizeMm} mm is outside the ISO 286 tables held here: over ${first} mm up to and including ${last} mm`,
    );
  }
  return row;
}
