import { describe, expect, it } from 'vitest';
import { triangleCount } from '../../../../shared/geometry/mesh';

describe('triangleCount', () => {
  it('counts nine floats per triangle when given a mesh', () => {
    expect(triangleCount({ positions: new Float32Array(27), normals: new Float32Array(9) })).toBe(3);
  });
});
