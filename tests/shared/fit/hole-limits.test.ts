import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { holeLimits, isoGrades, standardTolerance } from '../../../shared/fit/index';

describe('holeLimits', () => {
  it('runs from 0 to +IT when the hole is H', () => {
    expect(holeLimits(7, 10)).toEqual({ upper: 15, lower: 0 }); // torqyx.vercel.app/standards/fits: "10 mm: H7 0/+15 µm"
    expect(holeLimits(8, 25)).toEqual({ upper: 33, lower: 0 }); // machinecalcs.com/iso-286-fit-table: 25 mm "H8/f7 0/+33"
    expect(holeLimits(7, 25)).toEqual({ upper: 21, lower: 0 }); // machinecalcs.com/iso-286-fit-table: 25 H7 0/+21
    expect(holeLimits(9, 50)).toEqual({ upper: 62, lower: 0 }); // machinecalcs.com/iso-286-fit-table: 50 H9 0/+62
  });

  it('has EI = 0 and ES = IT when the size and grade are anywhere in the tables', () => {
    // machinecalcs.com/iso-286-fit-table: "the hole is always letter H with lower deviation EI = 0"
    fc.assert(
      fc.property(fc.double({ min: 3.0001, max: 50, noNaN: true }), fc.constantFrom(...isoGrades), (size, grade) => {
        expect(holeLimits(grade, size)).toEqual({ upper: standardTolerance(size, grade), lower: 0 });
      }),
    );
  });

  it('throws a RangeError when the size is outside 3–50 mm', () => {
    expect(() => holeLimits(7, 60)).toThrow(/60 mm .*over 3 mm up to and including 50 mm/);
  });
});
