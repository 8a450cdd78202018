import { describe, expect, it } from 'vitest';
import { geom3ToMesh, meshVolume } from '../../../../shared/geometry/mesh';
import { keyPin } from '../../../../shared/geometry/key-pin';
import { pocketCutter } from '../../../../shared/geometry/pocket-cutter';
import { keySection } from '../../../../shared/geometry/section/key-section';
import { mergeSolids } from '../../../../shared/geometry/solid/merge-solids';
import { edgeCheck } from '../../../helpers/mesh/edge-check';
import { expectRelative } from '../../../helpers/mesh/expect-relative';

describe('mergeSolids', () => {
  it('keeps every shell closed and adds the volumes when the solids are apart', () => {
    const section = keySection({ shape: 'square', width: 10 });
    const one = pocketCutter({ section, clearance: 0.1, depth: 8, half: 'A', position: [-20, 0] });
    const two = pocketCutter({ section, clearance: 0.1, depth: 8, half: 'A', position: [20, 0] });
    const merged = geom3ToMesh(mergeSolids([one, two]));
    expect(edgeCheck(merged)).toMatchObject({ unmatched: 0, repeated: 0 });
    expectRelative(meshVolume(merged), 2 * 10.2 * 10.2 * 9);
  });

  it('returns the single solid unchanged in volume when given one', () => {
    const key = keyPin({ shape: 'square', width: 10, keyLength: 10 });
    expectRelative(meshVolume(geom3ToMesh(mergeSolids([key]))), 1000);
  });
});
