import { describe, expect, it } from 'vitest';
import { degreesToRadians, radians } from '../../../shared/geometry/units';

describe('degreesToRadians', () => {
  it('turns 180° into π when converting at the form boundary', () => {
    expect(degreesToRadians(180)).toBeCloseTo(Math.PI, 15);
  });
});

describe('radians', () => {
  it('returns the same number when branding an angle already in radians', () => {
    expect(radians(0.5)).toBe(0.5);
  });
});
