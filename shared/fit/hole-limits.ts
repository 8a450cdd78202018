import type { IsoGrade } from './iso286-tables';
import { standardTolerance } from './standard-tolerance';
import type { ToleranceLimits } from './tolerance-limits';

/**
 * Limits of an ISO 286 H hole: it runs from the nominal size upwards, so EI = 0 and ES = +IT.
 *
 * @param grade - tolerance grade 6 to 11
 * @param sizeMm - nominal size in mm, over 3 up to and including 50
 * @returns `{ upper, lower }` in µm
 * @throws RangeError with the numbers for a size or grade outside the tables
 * @example
 * holeLimits(7, 10); // { upper: 15, lower: 0 } (a 10 H7 hole is 10.000 to 10.015 mm)
 */
export function holeLimits(grade: IsoGrade, sizeMm: number): ToleranceLimits {
  return { upper: standardTolerance(sizeMm, grade), lower: 0 };
}
