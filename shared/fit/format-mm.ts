import { roundTo } from './round-to';

/**
 * Writes a length for people: rounded to 0.001 mm, no trailing zeros, a true minus sign (−), and with
 * `signed` a leading + for adjustments.
 *
 * @param mm - length in mm
 * @param signed - write "+0.02 mm" / "−0.03 mm" / "±0 mm"; default false
 * @returns the text, unit included
 * @example
 * formatMm(0.15); // "0.15 mm"
 * formatMm(-0.03, true); // "−0.03 mm"
 */
export function formatMm(mm: number, signed = false): string {
  const value = roundTo(mm, 3);
  const digits = String(Math.abs(value));
  if (value < 0) return `−${digits} mm`;
  if (!signed) return `${digits} mm`;
  return value === 0 ? '±0 mm' : `+${digits} mm`;
}
