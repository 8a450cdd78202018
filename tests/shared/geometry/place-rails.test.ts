import { describe, expect, it } from 'vitest';
import { GeometryError } from '../../../shared/geometry/geometry-error';
import { placeRails } from '../../../shared/geometry/place-rails';
import { radians } from '../../../shared/geometry/units';

const base = {
  face: { shape: 'rect' as const, width: 90, height: 60 },
  count: 3,
  rootWidth: 10,
  height: 6,
  flankAngle: radians(Math.atan(1 / 6)),
  clearance: 0.15,
  margin: 2,
  endStop: false,
  endStopWall: 3,
  chamfer: 0.5,
};

function errorOf(fn: () => unknown): GeometryError {
  try {
    fn();
  } catch (error) {
    if (error instanceof GeometryError) return error;
    throw error;
  }
  throw new Error('expected a GeometryError');
}

describe('placeRails', () => {
  it('spreads rails evenly across the face and runs them its whole length when nothing else is given', () => {
    const rails = placeRails(base);
    expect(rails.map((r) => r.x)).toEqual([-30, 0, 30]);
    expect(rails[0]).toMatchObject({ y0: -30, y1: 30, slotY0: -31, slotY1: 31 });
  });

  it('stops the slot a wall short of the +y edge and the rail a clearance before it when there is an end stop', () => {
    const [r] = placeRails({ ...base, count: 1, endStop: true });
    expect(r!.slotY1).toBeCloseTo(27, 9);
    expect(r!.y1).toBeCloseTo(26.85, 9);
    expect(r!.y0).toBeCloseTo(-30, 9);
    expect(r!.slotY0).toBeCloseTo(-31, 9);
  });

  it('keeps rails inside the narrowest chord of a round face when the face is a circle', () => {
    const [r] = placeRails({ ...base, face: { shape: 'circle', diameter: 60 }, count: 1 });
    // The rail's top is 12 mm wide: its ends sit where the chord at x = ±6 meets the circle (derived).
    expect(r!.y1).toBeCloseTo(Math.sqrt(30 * 30 - 36), 9);
  });

  it('throws RAIL_DOES_NOT_FIT with the numbers when the pitch leaves walls thinner than the margin', () => {
    const error = errorOf(() => placeRails({ ...base, pitch: 13 }));
    expect(error.code).toBe('RAIL_DOES_NOT_FIT');
    expect(error.message).toMatch(
      /3 dovetail slots 12\.\d+ mm wide at 13 mm pitch leave 0\.\d+ mm of wall between them; at least 2 mm is needed/,
    );
  });

  it('throws RAIL_DOES_NOT_FIT with the numbers when a slot would reach past the face edge', () => {
    const error = errorOf(() => placeRails({ ...base, pitch: 40 }));
    expect(error.message).toMatch(
      /slot at x = -40 mm is 12\.\d+ mm wide and needs 2 mm of wall beside it, out to x = -48\.18 mm, which is past the face's edge/,
    );
  });

  it('throws RAIL_DOES_NOT_FIT with the room available when the rail asked for is longer than the face', () => {
    const error = errorOf(() => placeRails({ ...base, count: 1, length: 70 }));
    expect(error.message).toBe(
      'the face has room for a dovetail rail 60 mm long at x = 0 mm; a 70 mm rail was asked for',
    );
  });
});
