import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { standardTolerance, type IsoGrade } from '../../../shared/fit/index';

// Each row: a size inside the range (and its inclusive upper end), then IT6..IT11 in µm.
// Every cell checked against ISO 286-2 via Machine Drawing Table 15.1 (REFERENCES §1.1); the same cells are in
// "Index of ISO hole and shaft" (engineersvault) and, for IT6–IT9, the BIG DAISHOWA catalog p. 139.
const table: Array<[number, number, number[]]> = [
  [4, 6, [8, 12, 18, 30, 48, 75]], // Machine Drawing Table 15.1, over 3 to 6
  [8, 10, [9, 15, 22, 36, 58, 90]], // Machine Drawing Table 15.1, over 6 to 10
  [12, 18, [11, 18, 27, 43, 70, 110]], // Machine Drawing Table 15.1, over 10 to 18
  [25, 30, [13, 21, 33, 52, 84, 130]], // Machine Drawing Table 15.1, over 18 to 30
  [40, 50, [16, 25, 39, 62, 100, 160]], // Machine Drawing Table 15.1, over 30 to 50
];
const grades: IsoGrade[] = [6, 7, 8, 9, 10, 11];

describe('standardTolerance', () => {
  it.each(table)('returns the table value when the size is %s mm (range up to %s mm)', (inside, upTo, values) => {
    grades.forEach((grade, i) => {
      expect(standardTolerance(inside, grade)).toBe(values[i]); // Machine Drawing Table 15.1
      expect(standardTolerance(upTo, grade)).toBe(values[i]); // Machine Drawing Table 15.1 ("To and inc")
    });
  });

  it('puts a size on a range boundary in the lower range when the size is exactly 10 mm', () => {
    expect(standardTolerance(10, 7)).toBe(15); // Machine Drawing Table 15.1, "Over … To and inc"
    expect(standardTolerance(10.001, 7)).toBe(18); // Machine Drawing Table 15.1, "Over … To and inc"
  });

  it('uses the boundary rule at every range end when the size is just above it', () => {
    expect(standardTolerance(6, 6)).toBe(8); // Machine Drawing Table 15.1
    expect(standardTolerance(6.001, 6)).toBe(9); // Machine Drawing Table 15.1
    expect(standardTolerance(18, 8)).toBe(27); // Machine Drawing Table 15.1
    expect(standardTolerance(18.001, 8)).toBe(33); // Machine Drawing Table 15.1
    expect(standardTolerance(30, 11)).toBe(130); // Machine Drawing Table 15.1
    expect(standardTolerance(30.001, 11)).toBe(160); // Machine Drawing Table 15.1
    expect(standardTolerance(3.001, 9)).toBe(30); // Machine Drawing Table 15.1, "over 3"
  });

  it('returns the table value, not the formula, when the two differ', () => {
    // Engineers Edge IT formula gives 7.33 µm for IT6 over 3 to 6 (REFERENCES §1.1, derived); the table says 8.
    expect(standardTolerance(5, 6)).toBe(8); // Machine Drawing Table 15.1
  });

  it('grows with the grade when the size is fixed', () => {
    fc.assert(
      fc.property(fc.double({ min: 3.0001, max: 50, noNaN: true }), (size) => {
        const values = grades.map((grade) => standardTolerance(size, grade));
        values.slice(1).forEach((value, i) => expect(value).toBeGreaterThan(values[i] ?? Infinity));
      }),
    );
  });

  it('throws a RangeError with the numbers when the size is outside 3–50 mm', () => {
    expect(() => standardTolerance(3, 7)).toThrow(RangeError);
    expect(() => standardTolerance(3, 7)).toThrow(/3 mm .*over 3 mm up to and including 50 mm/);
    expect(() => standardTolerance(50.001, 7)).toThrow(/50\.001 mm/);
    expect(() => standardTolerance(0, 7)).toThrow(RangeError);
    expect(() => standardTolerance(-10, 7)).toThrow(RangeError);
    expect(() => standardTolerance(Number.NaN, 7)).toThrow(/NaN mm/);
    expect(() => standardTolerance(Number.POSITIVE_INFINITY, 7)).toThrow(RangeError);
  });

  it('throws a RangeError when the grade is outside IT6–IT11', () => {
    expect(() => standardTolerance(10, 12 as IsoGrade)).toThrow(/IT12 .*IT6 to IT11/);
    expect(() => standardTolerance(10, 5 as IsoGrade)).toThrow(RangeError);
  });
});
