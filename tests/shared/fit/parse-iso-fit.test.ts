import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { isoGrades, parseIsoFit, shaftLetters } from '../../../shared/fit/index';

describe('parseIsoFit', () => {
  it('reads size, hole and shaft when the text is written the usual way', () => {
    expect(parseIsoFit('10 H7/g6')).toEqual({ size: 10, holeGrade: 7, shaftLetter: 'g', shaftGrade: 6 });
    expect(parseIsoFit('10 H11/c11')).toEqual({ size: 10, holeGrade: 11, shaftLetter: 'c', shaftGrade: 11 });
  });

  it('reads the same fit when spaces are missing, extra or around the slash', () => {
    const expected = { size: 10, holeGrade: 7, shaftLetter: 'g', shaftGrade: 6 };
    expect(parseIsoFit('10H7/g6')).toEqual(expected);
    expect(parseIsoFit('  10   H7 / g6  ')).toEqual(expected);
    expect(parseIsoFit('10 mm H7/g6')).toEqual(expected);
    expect(parseIsoFit('10mmH7/g6')).toEqual(expected);
  });

  it('reads a decimal size when the size has a fraction', () => {
    expect(parseIsoFit('12.5 H8/f7').size).toBe(12.5);
  });

  it('reads back every fit it can describe when size, grades and letter vary', () => {
    fc.assert(
      fc.property(
        fc.integer({ min: 4, max: 50 }),
        fc.constantFrom(...isoGrades),
        fc.constantFrom(...shaftLetters),
        fc.constantFrom(...isoGrades),
        fc.constantFrom('', ' ', '  '),
        (size, holeGrade, shaftLetter, shaftGrade, gap) => {
          const text = `${size}${gap}H${holeGrade}${gap}/${gap}${shaftLetter}${shaftGrade}`;
          expect(parseIsoFit(text)).toEqual({ size, holeGrade, shaftLetter, shaftGrade });
        },
      ),
    );
  });

  it('names the wrong hole when the hole letter is not H', () => {
    expect(() => parseIsoFit('10 X7/g6')).toThrow(RangeError);
    expect(() => parseIsoFit('10 X7/g6')).toThrow(/hole "X7" is not held here: only H holes/);
    expect(() => parseIsoFit('10 h7/g6')).toThrow(/hole letters are capitals: write "H7", not "h7"/);
  });

  it('says the size is missing when the text starts with the hole', () => {
    expect(() => parseIsoFit('H7/g6')).toThrow(SyntaxError);
    expect(() => parseIsoFit('H7/g6')).toThrow(/"H7\/g6" is not an ISO fit: it has no size in front/);
  });

  it('says the fit is empty when the text is empty or blank', () => {
    expect(() => parseIsoFit('')).toThrow(SyntaxError);
    expect(() => parseIsoFit('')).toThrow(/empty.*"10 H7\/g6"/);
    expect(() => parseIsoFit('   ')).toThrow(/empty/);
  });

  it('says a shaft is missing when there is no slash', () => {
    expect(() => parseIsoFit('10 H7')).toThrow(/needs a hole and a shaft separated by "\/"/);
    expect(() => parseIsoFit('10 H7g6')).toThrow(SyntaxError);
  });

  it('names the wrong shaft when the letter is outside c–h or in capitals', () => {
    expect(() => parseIsoFit('10 H7/k6')).toThrow(/shaft "k6" is not held here: only c, d, e, f, g and h/);
    expect(() => parseIsoFit('10 H7/G6')).toThrow(/shaft letters are lower case: write "g6", not "G6"/);
    expect(() => parseIsoFit('10 H7/gg6')).toThrow(/shaft "gg6"/);
  });

  it('names the wrong grade when a grade is outside 6–11', () => {
    expect(() => parseIsoFit('10 H12/g6')).toThrow(/grade 12 in "H12" is not held here: grades 6 to 11/);
    expect(() => parseIsoFit('10 H7/g5')).toThrow(/grade 5 in "g5"/);
  });

  it('gives the numbers when the size is outside 3–50 mm', () => {
    expect(() => parseIsoFit('3 H7/g6')).toThrow(/size 3 mm .*over 3 mm up to and including 50 mm/);
    expect(() => parseIsoFit('51 H7/g6')).toThrow(RangeError);
    expect(() => parseIsoFit('0 H7/g6')).toThrow(/size 0 mm/);
    expect(() => parseIsoFit('-10 H7/g6')).toThrow(/no size in front/);
  });

  it('never throws anything but a SyntaxError or RangeError when the text is arbitrary', () => {
    fc.assert(
      fc.property(fc.string({ maxLength: 30 }), (text) => {
        try {
          parseIsoFit(text);
        } catch (error) {
          expect(error instanceof SyntaxError || error instanceof RangeError).toBe(true);
          expect((error as Error).message.length).toBeGreaterThan(10);
        }
      }),
    );
  });
});
