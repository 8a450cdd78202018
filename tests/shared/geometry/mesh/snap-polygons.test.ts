import jscad from '@jscad/modeling';
import { describe, expect, it } from 'vitest';
import { keyPin } from '../../../../shared/geometry/key-pin';
import { snapPolygons } from '../../../../shared/geometry/mesh/snap-polygons';
import type { Geom3 } from '../../../../shared/geometry/solid/jscad-types';

const { geom3, poly3 } = jscad.geometries;
const jscadSnap = jscad.modifiers.snap as unknown as (g: Geom3) => Geom3;

/** JSCAD's own snap (what @jscad/stl-serializer runs first), flattened for comparison. */
function reference(solid: Geom3): number[][] {
  return geom3.toPolygons(jscadSnap(solid)).map((p) => p.vertices.flatMap((v) => [v[0], v[1], v[2]]));
}

function mine(solid: Geom3): number[][] {
  const { coords, starts, sizes } = snapPolygons(geom3.toPolygons(solid));
  const out: number[][] = [];
  sizes.forEach((n, i) => {
    if (n > 0) out.push(Array.from(coords.subarray(3 * starts[i]!, 3 * (starts[i]! + n))));
  });
  return out;
}

describe('snapPolygons', () => {
  it('gives exactly JSCAD snap corners when the solid is a Seamwright key', () => {
    const key = keyPin({ shape: 'round', width: 8, flat: 1, keyLength: 15.6, chamfer: 0.4 });
    expect(mine(key)).toEqual(reference(key));
  });

  it('drops repeated corners and zero-area polygons as JSCAD does when the input has them', () => {
    const solid = geom3.create([
      poly3.create([
        [0, 0, 0],
        [10, 0, 0],
        [10, 0, 0],
        [10, 10, 0],
      ]),
      poly3.create([
        [0, 0, 0],
        [5, 0, 0],
        [10, 0, 0],
      ]),
      poly3.create([
        [0, 0, 1],
        [1e-9, 0, 1],
        [0, 1e-9, 1],
      ]),
    ]);
    expect(mine(solid)).toEqual(reference(solid));
    expect(mine(solid)).toHaveLength(1);
  });
});
