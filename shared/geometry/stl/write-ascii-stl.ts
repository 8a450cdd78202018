import type { TriangleMesh } from '../mesh/triangle-mesh';

/**
 * Writes a mesh as ASCII STL: `solid name`, then per triangle `facet normal`, `outer loop`, three `vertex`
 * lines, `endloop`, `endfacet`, and `endsolid name` (StereoLithography Interface Specification, 1989:
 * lower-case keywords, spaces only). Each number is the shortest decimal that reads back as the same
 * float32, so an ASCII file carries exactly the binary file's values. Coordinates may be negative: the
 * 1989 rule that vertices be positive is no longer enforced by readers (REFERENCES §3.1).
 *
 * @param mesh - triangles and normals, see {@link TriangleMesh}
 * @param name - solid name, letters, digits, '-' and '_' kept, others replaced by '_'; default 'seamwright'
 * @returns the file's text
 * @example
 * writeAsciiStl(mesh, 'key').startsWith('solid key\n'); // true
 */
export function writeAsciiStl(mesh: TriangleMesh, name = 'seamwright'): string {
  const safe = name.replace(/[^A-Za-z0-9_-]/g, '_') || 'seamwright';
  const { positions: p, normals: n } = mesh;
  // Corners are shared by about six triangles and normals repeat along every loft side, so each value's
  // text is worked out once: the shortest-decimal search costs up to nine toPrecision calls.
  const known = new Map<number, string>();
  const f32 = (value: number) => {
    let text = known.get(value);
    if (text === undefined) known.set(value, (text = shortestFloat32(value)));
    return text;
  };
  const lines: string[] = [`solid ${safe}`];
  for (let t = 0; t < n.length / 3; t++) {
    lines.push(`  facet normal ${f32(n[3 * t]!)} ${f32(n[3 * t + 1]!)} ${f32(n[3 * t + 2]!)}`, '    outer loop');
    for (let k = 0; k < 3; k++) {
      const i = 9 * t + 3 * k;
      lines.push(`      vertex ${f32(p[i]!)} ${f32(p[i + 1]!)} ${f32(p[i + 2]!)}`);
    }
    lines.push('    endloop', '  endfacet');
  }
  lines.push(`endsolid ${safe}`, '');
  return lines.join('\n');
}

/** Shortest decimal text that parses back to the same float32 (at most 9 significant digits). */
function shortestFloat32(value: number): string {
  if (value === 0) return '0';
  for (let digits = 1; digits < 9; digits++) {
    const text = value.toPrecision(digits);
    if (Math.fround(Number(text)) === value) return String(Number(text));
  }
  return String(Number(value.toPrecision(9)));
}
