import { describe, expect, it } from 'vitest';
import { keyOnBed } from '../../../../shared/geometry/key-on-bed';
import { keyPin } from '../../../../shared/geometry/key-pin';
import { geom3ToMesh } from '../../../../shared/geometry/mesh';
import { writeAsciiStl } from '../../../../shared/geometry/stl';
import { threeParse } from '../../../helpers/mesh/stl-readers';

const mesh = geom3ToMesh(keyOnBed(keyPin({ shape: 'round', width: 8, flat: 1, keyLength: 15.6, chamfer: 0.4 })));

describe('writeAsciiStl', () => {
  it('is read back by three.js STLLoader with exactly the binary float32 corners when parsed', () => {
    expect(Array.from(threeParse(writeAsciiStl(mesh, 'key')))).toEqual(Array.from(mesh.positions));
  });

  it('follows the 1989 ASCII syntax with lower-case keywords and spaces only when written', () => {
    // StereoLithography Interface Specification, 1989, via REFERENCES §3.1.
    const text = writeAsciiStl(mesh, 'key');
    expect(text.startsWith('solid key\n  facet normal ')).toBe(true);
    expect(text.endsWith('endsolid key\n')).toBe(true);
    expect(text).not.toMatch(/\t/);
    expect(text.match(/^ {4}outer loop$/gm)).toHaveLength(mesh.normals.length / 3);
    expect(text.match(/^ {6}vertex \S+ \S+ \S+$/gm)).toHaveLength(mesh.positions.length / 3);
  });

  it('replaces characters a solid name cannot hold when the name has spaces', () => {
    expect(writeAsciiStl(mesh, 'pocket cutter A').startsWith('solid pocket_cutter_A\n')).toBe(true);
  });
});
