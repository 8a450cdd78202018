import jscad from '@jscad/modeling';
import { describe, expect, it } from 'vitest';
import { dovetailRail } from '../../../../shared/geometry/dovetail-rail';
import { keyOnBed } from '../../../../shared/geometry/key-on-bed';
import { keyPin } from '../../../../shared/geometry/key-pin';
import { geom3ToMesh } from '../../../../shared/geometry/mesh';
import { pocketCutter } from '../../../../shared/geometry/pocket-cutter';
import { keySection } from '../../../../shared/geometry/section/key-section';
import { radians } from '../../../../shared/geometry/units';
import { readBinaryStl, referenceStl } from '../../../helpers/mesh/stl-readers';

const { primitives } = jscad;

const solids = {
  'a chamfered square key on the bed': keyOnBed(keyPin({ shape: 'square', width: 10, keyLength: 15.6, chamfer: 0.4 })),
  'a round key with a flat': keyOnBed(keyPin({ shape: 'round', width: 8, flat: 1, keyLength: 15.6, chamfer: 0.4 })),
  'a hex pocket cutter with an entry chamfer': pocketCutter({
    section: keySection({ shape: 'hex', width: 8 }),
    clearance: 0.15,
    depth: 8,
    entryChamfer: 0.5,
    half: 'B',
    position: [12, -7],
  }),
  'a dovetail rail': dovetailRail({
    rootWidth: 10,
    height: 6,
    flankAngle: radians(Math.atan(1 / 8)),
    x: -3,
    y0: -25,
    y1: 25,
    chamfer: 0.5,
  }),
  'a JSCAD cylinder (caps with more than 4 corners)': primitives.cylinder({ radius: 3, height: 5, segments: 24 }),
  'a JSCAD cuboid (quads)': primitives.cuboid({ size: [3, 4, 5], center: [1, 2, 3] }),
};

describe('geom3ToMesh', () => {
  for (const [what, solid] of Object.entries(solids)) {
    it(`gives the reference writer's triangles, order, orientation and normals when the solid is ${what}`, () => {
      const mesh = geom3ToMesh(solid);
      const ref = readBinaryStl(referenceStl(solid)); // @jscad/stl-serializer 2.1.23
      expect(ref.count).toBe(mesh.normals.length / 3);
      for (let t = 0; t < ref.count; t++) {
        for (let k = 0; k < 3; k++) expect(mesh.normals[3 * t + k]).toBe(ref.records[12 * t + k]);
        for (let k = 0; k < 9; k++) expect(mesh.positions[9 * t + k]).toBe(ref.records[12 * t + 3 + k]);
      }
    });
  }

  it('writes unit normals that agree with the corner order when converting any solid', () => {
    const mesh = geom3ToMesh(solids['a round key with a flat']);
    const p = mesh.positions;
    for (let t = 0; t < mesh.normals.length / 3; t++) {
      const n = [mesh.normals[3 * t]!, mesh.normals[3 * t + 1]!, mesh.normals[3 * t + 2]!];
      expect(Math.hypot(n[0]!, n[1]!, n[2]!)).toBeCloseTo(1, 6);
      const u = [p[9 * t + 3]! - p[9 * t]!, p[9 * t + 4]! - p[9 * t + 1]!, p[9 * t + 5]! - p[9 * t + 2]!];
      const v = [p[9 * t + 6]! - p[9 * t]!, p[9 * t + 7]! - p[9 * t + 1]!, p[9 * t + 8]! - p[9 * t + 2]!];
      const cross = [u[1]! * v[2]! - u[2]! * v[1]!, u[2]! * v[0]! - u[0]! * v[2]!, u[0]! * v[1]! - u[1]! * v[0]!];
      expect(cross[0]! * n[0]! + cross[1]! * n[1]! + cross[2]! * n[2]!).toBeGreaterThan(0);
    }
  });
});
