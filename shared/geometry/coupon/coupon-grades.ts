/**
 * The graded clearances of a coupon, mm per side: from, from + step, … up to and including `to` (within
 * 1 µm), each rounded to 0.1 µm so 0.1 + 0.05 reads 0.15 and not 0.15000000000000002.
 *
 * @param from - first clearance, mm
 * @param to - last clearance, mm (included when the steps land on it)
 * @param step - spacing, mm, > 0
 * @returns the clearances in ascending order
 * @example
 * couponGrades(0, 0.4, 0.05); // [0, 0.05, 0.1, …, 0.4] (9 grades)
 */
export function couponGrades(from: number, to: number, step: number): number[] {
  const count = Math.floor((to - from) / step + 1e-6) + 1;
  return Array.from({ length: count }, (_, i) => Math.round((from + i * step) * 1e4) / 1e4);
}
