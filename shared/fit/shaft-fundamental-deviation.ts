import { findSizeRow } from './find-size-row';
import { shaftDeviationRows, shaftLetters, type ShaftLetter } from './iso286-tables';

/**
 * The ISO 286 fundamental deviation of a shaft c to h: its upper deviation es, the distance from the
 * nominal size to the top of the shaft's tolerance zone. For these letters it is 0 or negative (the shaft
 * is at most its nominal size), which is what makes an H hole with them a clearance fit.
 *
 * @param letter - shaft letter, lower case: 'c', 'd', 'e', 'f', 'g' or 'h'
 * @param sizeMm - nominal size in mm, over 3 up to and including 50
 * @returns es in µm (0 or negative)
 * @throws RangeError with the numbers for a letter or size outside the tables
 * @example
 * shaftFundamentalDeviation('g', 10); // -5
 */
export function shaftFundamentalDeviation(letter: ShaftLetter, sizeMm: number): number {
  const column = shaftLetters.indexOf(letter);
  if (column < 0) {
    throw new RangeError(`shaft letter "${String(letter)}" is not held here: c, d, e, f, g and h are`);
  }
  const value = findSizeRow(shaftDeviationRows, sizeMm).values[column];
  if (value === undefined) throw new RangeError(`no es value for ${letter} at ${sizeMm} mm`);
  return value;
}
