import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { isoGrades, shaftLetters, shaftLimits, standardTolerance } from '../../../shared/fit/index';

describe('shaftLimits', () => {
  it('returns es and ei = es − IT when the fit is one of the worked examples', () => {
    expect(shaftLimits('g', 6, 10)).toEqual({ upper: -5, lower: -14 }); // torqyx.vercel.app/standards/fits: "g6 −14/−5 µm"
    expect(shaftLimits('f', 7, 20)).toEqual({ upper: -20, lower: -41 }); // derived from Machine Drawing Table 15.1 + Coban Engineering
    expect(shaftLimits('f', 7, 25)).toEqual({ upper: -20, lower: -41 }); // machinecalcs.com/iso-286-fit-table: 25 mm "−41/−20"
    expect(shaftLimits('c', 11, 10)).toEqual({ upper: -80, lower: -170 }); // derived from Machine Drawing Table 15.1 + Coban Engineering
    expect(shaftLimits('h', 6, 25)).toEqual({ upper: 0, lower: -13 }); // machinecalcs.com/iso-286-fit-table: 25 h6 0/−13
    expect(shaftLimits('g', 6, 25)).toEqual({ upper: -7, lower: -20 }); // machinecalcs.com/iso-286-fit-table: 25 g6 −7/−20
    expect(shaftLimits('d', 9, 50)).toEqual({ upper: -80, lower: -142 }); // machinecalcs.com/iso-286-fit-table: 50 d9 −80/−142
  });

  it('spans exactly IT when the letter, grade and size are anywhere in the tables', () => {
    // Machine Drawing §15.3.2: "Shafts, ei = es – IT"
    fc.assert(
      fc.property(
        fc.constantFrom(...shaftLetters),
        fc.constantFrom(...isoGrades),
        fc.double({ min: 3.0001, max: 50, noNaN: true }),
        (letter, grade, size) => {
          const { upper, lower } = shaftLimits(letter, grade, size);
          expect(upper - lower).toBe(standardTolerance(size, grade));
          expect(upper).toBeLessThanOrEqual(0);
        },
      ),
    );
  });

  it('throws a RangeError when the size is outside 3–50 mm', () => {
    expect(() => shaftLimits('g', 6, 3)).toThrow(RangeError);
    expect(() => shaftLimits('g', 6, 50.5)).toThrow(/50\.5 mm/);
  });
});
