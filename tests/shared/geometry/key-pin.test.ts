import { describe, expect, it } from 'vitest';
import { keyPin } from '../../../shared/geometry/key-pin';
import { geom3ToMesh, meshBounds, meshVolume } from '../../../shared/geometry/mesh';
import { edgeCheck } from '../../helpers/mesh/edge-check';

/** Volume of a frustum between similar sections A0 and A1, height h: h/3 · (A0 + A1 + √(A0·A1)) (derived). */
const frustum = (a0: number, a1: number, h: number) => (h / 3) * (a0 + a1 + Math.sqrt(a0 * a1));
const volumeOf = (params: Parameters<typeof keyPin>[0]) => meshVolume(geom3ToMesh(keyPin(params)));

describe('keyPin', () => {
  it('has the volume of a square prism, w²·L, when there is no chamfer (derived)', () => {
    expect(volumeOf({ shape: 'square', width: 10, keyLength: 15.6 })).toBeCloseTo(1560, 1);
  });

  it('subtracts two 45° frustums from the prism when both ends are chamfered (derived)', () => {
    const w = 10;
    const L = 15.6;
    const c = 0.4;
    const expected = w * w * (L - 2 * c) + 2 * frustum(w * w, (w - 2 * c) ** 2, c);
    expect(volumeOf({ shape: 'square', width: w, keyLength: L, chamfer: c })).toBeCloseTo(expected, 1);
  });

  it('uses the prismatoid formula at the ends when a rect key is chamfered (derived)', () => {
    const [w, l, L, c] = [10, 6, 12, 0.5];
    const end = (c / 6) * (w * l + 4 * (w - c) * (l - c) + (w - 2 * c) * (l - 2 * c));
    expect(volumeOf({ shape: 'rect', width: w, length: l, keyLength: L, chamfer: c })).toBeCloseTo(
      w * l * (L - 2 * c) + 2 * end,
      1,
    );
  });

  it('matches the n-gon prism with similar chamfer frustums when the key is round (derived)', () => {
    const r = 4;
    const n = 32;
    const a = r * Math.cos(Math.PI / n);
    const area = (n / 2) * r * r * Math.sin((2 * Math.PI) / n);
    const c = 0.4;
    const inset = area * ((a - c) / a) ** 2;
    expect(volumeOf({ shape: 'round', width: 8, keyLength: 15.6, chamfer: c })).toBeCloseTo(
      area * (15.6 - 2 * c) + 2 * frustum(area, inset, c),
      1,
    );
    // And within the chord tolerance of the true cylinder (π r² L): the polygon is inscribed.
    expect(volumeOf({ shape: 'round', width: 8, keyLength: 10 })).toBeGreaterThan(Math.PI * (r - 0.02) ** 2 * 10);
  });

  it('matches (√3/2)·w²·L when the key is a hex (derived)', () => {
    expect(volumeOf({ shape: 'hex', width: 8, keyLength: 10 })).toBeCloseTo((Math.sqrt(3) / 2) * 64 * 10, 1);
  });

  it('is a closed outward solid centred on the origin along z when built in place', () => {
    const mesh = geom3ToMesh(keyPin({ shape: 'round', width: 8, flat: 1, keyLength: 15.6, chamfer: 0.4 }));
    expect(edgeCheck(mesh)).toMatchObject({ unmatched: 0, repeated: 0, degenerate: 0 });
    const b = meshBounds(mesh);
    expect(b.min[2]).toBeCloseTo(-7.8, 3);
    expect(b.max[2]).toBeCloseTo(7.8, 3);
  });

  it('is a uniformly scaled copy when a scale below 1 is given', () => {
    const full = volumeOf({ shape: 'square', width: 10, keyLength: 15.6, chamfer: 0.4 });
    expect(volumeOf({ shape: 'square', width: 10, keyLength: 15.6, chamfer: 0.4, scale: 0.99 })).toBeCloseTo(
      full * 0.99 ** 3,
      1,
    );
  });
});
