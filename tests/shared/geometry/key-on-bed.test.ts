import { describe, expect, it } from 'vitest';
import { keyOnBed } from '../../../shared/geometry/key-on-bed';
import { keyPin } from '../../../shared/geometry/key-pin';
import { geom3ToMesh, meshBounds, meshVolume } from '../../../shared/geometry/mesh';
import { edgeCheck } from '../../helpers/mesh/edge-check';

describe('keyOnBed', () => {
  it('lays the key axis along x with its lowest point at z = 0 when given a key in place', () => {
    const mesh = geom3ToMesh(keyOnBed(keyPin({ shape: 'rect', width: 6, length: 10, keyLength: 16, chamfer: 0.4 })));
    const b = meshBounds(mesh);
    expect(b.min[2]).toBe(0);
    expect(b.max[0] - b.min[0]).toBeCloseTo(16, 3);
    // Face x (width 6) becomes bed z; face y (length 10) lies along bed y.
    expect(b.max[2]).toBeCloseTo(6, 3);
    expect(b.max[1] - b.min[1]).toBeCloseTo(10, 3);
  });

  it('keeps the solid closed, outward and of the same volume when it turns the key', () => {
    const key = keyPin({ shape: 'hex', width: 8, keyLength: 12, chamfer: 0.5 });
    const laid = geom3ToMesh(keyOnBed(key));
    expect(edgeCheck(laid)).toMatchObject({ unmatched: 0, repeated: 0 });
    expect(meshVolume(laid)).toBeCloseTo(meshVolume(geom3ToMesh(key)), 2);
  });

  it('rests a round key on its flat when the key has one', () => {
    const mesh = geom3ToMesh(keyOnBed(keyPin({ shape: 'round', width: 8, flat: 1, keyLength: 12 })));
    // Every corner at z = 0 belongs to the flat: the flat is 2·√(r² − (r − f)²) wide (derived).
    const ys: number[] = [];
    for (let i = 0; i < mesh.positions.length; i += 3) if (mesh.positions[i + 2] === 0) ys.push(mesh.positions[i + 1]!);
    expect(Math.max(...ys) - Math.min(...ys)).toBeCloseTo(2 * Math.sqrt(16 - 9), 3);
  });
});
