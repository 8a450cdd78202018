/**
 * Drops binary float noise from a computed number by keeping 12 significant digits.
 * Unlike {@link roundTo} it keeps small values at full relative precision, so a ratio and its inverse
 * still agree to about 1e-12.
 *
 * @param value - any finite number
 * @returns the same number without noise in its last bits; −0 becomes 0
 * @example
 * cleanFloat(((1 - 0.99) * 10) / 2); // 0.05 (not 0.05000000000000004)
 */
export function cleanFloat(value: number): number {
  const cleaned = Number(value.toPrecision(12));
  return cleaned === 0 ? 0 : cleaned;
}
