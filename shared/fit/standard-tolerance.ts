import { findSizeRow } from './find-size-row';
import { isoGrades, standardToleranceRows, type IsoGrade } from './iso286-tables';

/**
 * The ISO 286 standard tolerance (the width of the tolerance zone) for a size and grade, read from the
 * table, not computed from the IT formula (the table carries ISO's rounding).
 *
 * @param sizeMm - nominal size in mm, over 3 up to and including 50 (ranges include their upper end)
 * @param grade - tolerance grade 6 to 11 (IT6 to IT11)
 * @returns the tolerance in µm
 * @throws RangeError with the numbers for a size or grade outside the tables
 * @example
 * standardTolerance(10, 7); // 15 (10 mm is in "over 6 to 10")
 * standardTolerance(10.001, 7); // 18
 */
export function standardTolerance(sizeMm: number, grade: IsoGrade): number {
  const column = isoGrades.indexOf(grade);
  if (column < 0) {
    throw new RangeError(`tolerance grade IT${String(grade)} is not held here: grades IT6 to IT11 are`);
  }
  const value = findSizeRow(standardToleranceRows, sizeMm).values[column];
  // Every row has one value per grade; the check only satisfies noUncheckedIndexedAccess.
  if (value === undefined) throw new RangeError(`no IT${grade} value for ${sizeMm} mm`);
  return value;
}
