import { describe, expect, it } from 'vitest';
import { dovetailSection } from '../../../../shared/geometry/section/dovetail-section';
import { radians } from '../../../../shared/geometry/units';

describe('dovetailSection', () => {
  it('widens by 2 · height / n at the top when the slope is 1:n', () => {
    const s = dovetailSection({ rootWidth: 10, height: 6, flankAngle: radians(Math.atan(1 / 6)) });
    expect(s[0]).toEqual([-5, 0]);
    expect(s[2]![0]).toBeCloseTo(6, 12);
    expect(s[2]![1]).toBe(6);
  });
});
