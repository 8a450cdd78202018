import { describe, expect, it } from 'vitest';
import { shaftFundamentalDeviation, type ShaftLetter } from '../../../shared/fit/index';

const letters: ShaftLetter[] = ['c', 'd', 'e', 'f', 'g', 'h'];
// Each row: a size inside the range, the range's inclusive upper end, then es for c, d, e, f, g, h in µm.
const table: Array<[number, number, number[]]> = [
  [5, 6, [-70, -30, -20, -10, -4, 0]], // Coban Engineering "Upper and lower deviations shafts"; Machine Drawing Table 15.2
  [7, 10, [-80, -40, -25, -13, -5, 0]], // Coban Engineering "Upper and lower deviations shafts"; Machine Drawing Table 15.2
  [14, 18, [-95, -50, -32, -16, -6, 0]], // Coban Engineering "Upper and lower deviations shafts"; ZCC-CT "Basic deviations value of shaft"
  [20, 30, [-110, -65, -40, -20, -7, 0]], // Coban Engineering "Upper and lower deviations shafts"; ZCC-CT "Basic deviations value of shaft"
  [35, 40, [-120, -80, -50, -25, -9, 0]], // Coban Engineering "Upper and lower deviations shafts"; ZCC-CT "Basic deviations value of shaft"
  [45, 50, [-130, -80, -50, -25, -9, 0]], // Coban Engineering "Upper and lower deviations shafts"; ZCC-CT "Basic deviations value of shaft"
];

describe('shaftFundamentalDeviation', () => {
  it.each(table)('returns es from the table when the size is %s mm (range up to %s mm)', (inside, upTo, values) => {
    letters.forEach((letter, i) => {
      expect(shaftFundamentalDeviation(letter, inside)).toBe(values[i]); // Coban Engineering (see row)
      expect(shaftFundamentalDeviation(letter, upTo)).toBe(values[i]); // Coban Engineering (see row)
    });
  });

  it('gives −5 µm for g when the size is 6–10 mm, not the −8 of a bad reprint', () => {
    // Coban Engineering, ZCC-CT and Machine Drawing Table 15.2 agree on −5; the mechguru.com page's −8 is a typo.
    expect(shaftFundamentalDeviation('g', 10)).toBe(-5);
  });

  it('switches c at 40 mm when the size crosses the 30–40/40–50 split', () => {
    expect(shaftFundamentalDeviation('c', 30)).toBe(-110); // Coban Engineering "Upper and lower deviations shafts"
    expect(shaftFundamentalDeviation('c', 30.001)).toBe(-120); // Coban Engineering "Upper and lower deviations shafts"
    expect(shaftFundamentalDeviation('c', 40)).toBe(-120); // Coban Engineering "Upper and lower deviations shafts"
    expect(shaftFundamentalDeviation('c', 40.001)).toBe(-130); // Coban Engineering "Upper and lower deviations shafts"
    expect(shaftFundamentalDeviation('d', 40.001)).toBe(-80); // Coban Engineering "Upper and lower deviations shafts"
  });

  it('throws a RangeError with the numbers when the size is outside 3–50 mm', () => {
    expect(() => shaftFundamentalDeviation('g', 2)).toThrow(/2 mm .*over 3 mm up to and including 50 mm/);
    expect(() => shaftFundamentalDeviation('g', 51)).toThrow(RangeError);
  });

  it('throws a RangeError when the letter is not c to h', () => {
    expect(() => shaftFundamentalDeviation('k' as ShaftLetter, 10)).toThrow(/"k" .*c, d, e, f, g and h/);
    expect(() => shaftFundamentalDeviation('G' as ShaftLetter, 10)).toThrow(RangeError);
  });
});
