/**
 * Rounds a number to a fixed count of decimal places, without binary float noise and without −0.
 *
 * @param value - the number to round (any unit; in this folder, mm)
 * @param places - decimal places to keep, e.g. 3 for 0.001 mm
 * @returns the rounded number; halves round away from zero
 * @example
 * roundTo(0.1 + 0.02, 3); // 0.12 (not 0.12000000000000001)
 */
export function roundTo(value: number, places: number): number {
  const factor = 10 ** places;
  // toPrecision(12) first: 0.5005 * 1000 is 500.49999999999994 in binary, and a person expects it to round
  // as the decimal 500.5 it stands for. Twelve digits keep every mm value below a kilometre exact to 1 nm.
  const scaled = Number((value * factor).toPrecision(12));
  const rounded = (Math.sign(scaled) * Math.round(Math.abs(scaled))) / factor;
  // Math.sign(-0.3) * 0 is −0, which would print as "-0" in a derivation.
  return rounded === 0 ? 0 : rounded;
}
