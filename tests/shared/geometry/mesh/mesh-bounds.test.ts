import { describe, expect, it } from 'vitest';
import { meshBounds } from '../../../../shared/geometry/mesh';

describe('meshBounds', () => {
  it('returns the smallest and largest corner coordinates when given triangles', () => {
    const positions = new Float32Array([0, -1, 2, 3, 4, 5, -6, 7, 8]);
    expect(meshBounds({ positions, normals: new Float32Array(3) })).toEqual({ min: [-6, -1, 2], max: [3, 7, 8] });
  });
});
