import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { pocketGap } from '../../../../shared/geometry/layout/pocket-gap';
import { footprintArb } from './layout-arbitraries';
import { oracleGap } from './layout-oracle';

describe('pocketGap', () => {
  it('measures straight across when pockets sit side by side', () => {
    expect(pocketGap({ kind: 'rect', width: 10.4, height: 10.4 }, 13.4, 2)).toBeCloseTo(3, 12);
    expect(pocketGap({ kind: 'circle', diameter: 8 }, 6, 8)).toBe(2);
  });

  it('measures corner to corner when rectangles are offset on both axes', () => {
    expect(pocketGap({ kind: 'rect', width: 10, height: 10 }, 13, 14)).toBe(5); // 3-4-5 (derived)
  });

  it('agrees with an edge-by-edge distance and is negative when pockets overlap', () => {
    const offset = fc.double({ min: -80, max: 80, noNaN: true });
    fc.assert(
      fc.property(footprintArb, offset, offset, (fp, dx, dy) => {
        const got = pocketGap(fp, dx, dy);
        const expected = oracleGap(fp, [0, 0], [dx, dy]);
        if (expected < 0) expect(got).toBeLessThan(0);
        else expect(got).toBeCloseTo(expected, 9);
      }),
      { numRuns: 500 },
    );
  });
});
