import { expect } from 'vitest';

/**
 * Expects `actual` within a relative tolerance of `expected`. Mesh volumes are measured after JSCAD's
 * snapping (corners move up to 5e-6 × the mean bounding-box side), so they agree with exact formulas to
 * about 1e-5 relative, not to a fixed number of decimals.
 */
export function expectRelative(actual: number, expected: number, relative = 1e-4): void {
  expect(Math.abs(actual - expected)).toBeLessThanOrEqual(relative * Math.abs(expected));
}
