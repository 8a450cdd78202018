/** How {@link formatMm} rounds to the hundredth of a millimetre. */
export type MmRounding = 'up' | 'down' | 'nearest';

/**
 * Formats a length for a user message: at most two decimals, trailing zeros dropped.
 *
 * @param mm - the length in mm
 * @param rounding - `'up'` for what the user needs (never understate it), `'down'` for what they
 *   have (never overstate it), `'nearest'` otherwise. Default `'nearest'`.
 * @returns the number as text, without the unit
 * @example
 * formatMm(16.400000000000002, 'up'); // "16.4"
 * formatMm(12);                        // "12"
 */
export function formatMm(mm: number, rounding: MmRounding = 'nearest'): string {
  // The 1e-6 keeps binary noise (16.4 * 100 = 1639.99…) from pushing a value over a hundredth.
  const scaled = mm * 100;
  const hundredths =
    rounding === 'up' ? Math.ceil(scaled - 1e-6) : rounding === 'down' ? Math.floor(scaled + 1e-6) : Math.round(scaled);
  const value = hundredths / 100;
  return String(value === 0 ? 0 : value);
}
