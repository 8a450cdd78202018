import type { IsoGrade, ShaftLetter } from './iso286-tables';
import { shaftFundamentalDeviation } from './shaft-fundamental-deviation';
import { standardTolerance } from './standard-tolerance';
import type { ToleranceLimits } from './tolerance-limits';

/**
 * Limits of an ISO 286 shaft c to h: es from the deviation table, ei = es − IT.
 *
 * @param letter - shaft letter 'c' to 'h'
 * @param grade - tolerance grade 6 to 11
 * @param sizeMm - nominal size in mm, over 3 up to and including 50
 * @returns `{ upper, lower }` in µm (both 0 or negative)
 * @throws RangeError with the numbers for a letter, grade or size outside the tables
 * @example
 * shaftLimits('g', 6, 10); // { upper: -5, lower: -14 }
 */
export function shaftLimits(letter: ShaftLetter, grade: IsoGrade, sizeMm: number): ToleranceLimits {
  const upper = shaftFundamentalDeviation(letter, sizeMm);
  return { upper, lower: upper - standardTolerance(sizeMm, grade) };
}
