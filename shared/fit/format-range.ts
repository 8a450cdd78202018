import type { ClearanceDefault } from './clearance-defaults';

/**
 * Names a published clearance range in words, for a derivation.
 *
 * @param range - `{ min?, max? }` in mm per side; a missing end is open
 * @returns e.g. "the published 0.1–0.3 mm range", "the published range below 0.15 mm"
 * @example
 * formatRange({ min: 0.3 }); // "the published range above 0.3 mm"
 */
export function formatRange(range: ClearanceDefault['range']): string {
  const { min, max } = range;
  if (min !== undefined && max !== undefined) return `the published ${min}–${max} mm range`;
  if (max !== undefined) return `the published range below ${max} mm`;
  if (min !== undefined) return `the published range above ${min} mm`;
  return 'no published range';
}
