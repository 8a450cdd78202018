import type { Poly3 } from '../solid/jscad-types';

/** JSCAD's EPS (maths/constants): the snapping grid is EPS × the mean bounding-box side. */
const JSCAD_EPS = 1e-5;

/** Polygons after JSCAD's snap, as flat arrays: polygon i has `sizes[i]` corners from corner `starts[i]`. */
export interface SnappedPolygons {
  /** Snapped corners, x y z each, polygon after polygon, in mm. */
  readonly coords: Float64Array;
  /** Index (in corners) of each polygon's first corner. */
  readonly starts: Int32Array;
  /** Corners of each polygon after repeated ones are dropped; 0 when JSCAD would drop the whole polygon. */
  readonly sizes: Int32Array;
  /** The grid step, mm. */
  readonly epsilon: number;
}

/**
 * Does what JSCAD's `modifiers.snap` does to a solid's polygons (the first step of @jscad/stl-serializer),
 * with the same arithmetic but into flat typed arrays instead of one object per corner, about 10× faster:
 * the grid step is 1e-5 × the mean side of the bounding box; each coordinate becomes
 * round(v / step) · step + 0; a corner equal to the next one (cyclically) is dropped; a polygon left with
 * an area of at most step² · √3 / 4 is dropped. The area here is the polygon's own (Newell) area, where JSCAD
 * projects onto a plane first; the two agree except within rounding of that tiny threshold, which no
 * Seamwright solid comes near (features are at least MIN_FEATURE_MM, over a thousand grid steps).
 *
 * @param polygons - a solid's polygons with transforms applied (`geom3.toPolygons`)
 * @returns the snapped corners and the polygon layout, see {@link SnappedPolygons}
 * @example
 * snapPolygons(geom3.toPolygons(keyPin({ shape: 'square', width: 10, keyLength: 16 }))).epsilon; // 1.2e-4
 */
export function snapPolygons(polygons: readonly Poly3[]): SnappedPolygons {
  let total = 0;
  let largest = 0;
  for (const p of polygons) {
    total += p.vertices.length;
    largest = Math.max(largest, p.vertices.length);
  }
  const epsilon = gridStep(polygons);
  const minArea = (epsilon * epsilon * Math.sqrt(3)) / 4;
  const out = {
    coords: new Float64Array(total * 3),
    starts: new Int32Array(polygons.length),
    sizes: new Int32Array(polygons.length),
    epsilon,
  };
  const scratch = new Float64Array(largest * 3);
  let at = 0;
  for (let i = 0; i < polygons.length; i++) {
    const vertices = polygons[i]!.vertices;
    const n = vertices.length;
    for (let c = 0; c < n; c++) {
      const v = vertices[c]!;
      for (let k = 0; k < 3; k++) scratch[3 * c + k] = Math.round(v[k]! / epsilon) * epsilon + 0;
    }
    out.starts[i] = at;
    const kept = keepDistinct(scratch, n, out.coords, at);
    const keep = kept >= 3 && polygonArea(out.coords, at, kept) > minArea;
    out.sizes[i] = keep ? kept : 0;
    if (keep) at += kept;
  }
  return out;
}

/** Copies the corners that differ from their cyclic successor (JSCAD's rule) to `coords` at corner `at`. */
function keepDistinct(scratch: Float64Array, n: number, coords: Float64Array, at: number): number {
  let kept = 0;
  for (let c = 0; c < n; c++) {
    const d = ((c + 1) % n) * 3;
    const e = 3 * c;
    if (scratch[e] === scratch[d] && scratch[e + 1] === scratch[d + 1] && scratch[e + 2] === scratch[d + 2]) continue;
    const o = 3 * (at + kept++);
    coords[o] = scratch[e]!;
    coords[o + 1] = scratch[e + 1]!;
    coords[o + 2] = scratch[e + 2]!;
  }
  return kept;
}

/** JSCAD's measureEpsilon for a solid: EPS × (dx + dy + dz) / 3 over every corner, summed in that order. */
function gridStep(polygons: readonly Poly3[]): number {
  const min = [Infinity, Infinity, Infinity];
  const max = [-Infinity, -Infinity, -Infinity];
  for (const p of polygons) {
    for (const v of p.vertices) {
      for (let k = 0; k < 3; k++) {
        if (v[k]! < min[k]!) min[k] = v[k]!;
        if (v[k]! > max[k]!) max[k] = v[k]!;
      }
    }
  }
  let total = 0;
  for (let k = 0; k < 3; k++) total += max[k]! - min[k]!;
  return (JSCAD_EPS * total) / 3;
}

/** Area of a planar polygon from the length of its Newell vector, mm². */
function polygonArea(coords: Float64Array, start: number, n: number): number {
  let x = 0;
  let y = 0;
  let z = 0;
  for (let c = 0; c < n; c++) {
    const a = 3 * (start + c);
    const b = 3 * (start + ((c + 1) % n));
    x += coords[a + 1]! * coords[b + 2]! - coords[a + 2]! * coords[b + 1]!;
    y += coords[a + 2]! * coords[b]! - coords[a]! * coords[b + 2]!;
    z += coords[a]! * coords[b + 1]! - coords[a + 1]! * coords[b]!;
  }
  return Math.hypot(x, y, z) / 2;
}
