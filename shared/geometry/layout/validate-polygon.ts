import { MAX_POLYGON_POINTS } from '../../schemas/face';
import { GeometryError } from '../geometry-error';
import { polygonRing, type PolygonRing } from './polygon-ring';
import { segmentContact } from './segment-contact';

/**
 * Checks that polygon points describe a usable face outline: finite numbers, at least 3 distinct
 * points, not all on one line, and no edge crossing, touching or folding back onto another. Either
 * winding is fine; a closing point equal to the first is ignored. Edges are named by the points
 * they join, counted from 1 in the order given ("edges 2–3 and 5–6 cross near (12.5, 4.0)").
 *
 * Work: edges sorted along x and swept, so only edges whose x-ranges overlap are compared; at
 * 1000 points this takes a few milliseconds.
 *
 * @param points - [x, y] in mm, at most `MAX_POLYGON_POINTS` (1000)
 * @throws GeometryError `WORK_LIMIT` above 1000 points; `POLYGON_INVALID` for any other fault
 * @example
 * validatePolygon([[0, 0], [10, 0], [10, 10], [0, 10]]); // fine
 * validatePolygon([[0, 0], [10, 10], [10, 0], [0, 10]]); // throws: edges 1–2 and 3–4 cross near (5.0, 5.0)
 */
export function validatePolygon(points: Array<[number, number]>): void {
  if (points.length > MAX_POLYGON_POINTS) {
    throw new GeometryError(
      'WORK_LIMIT',
      `a polygon face may have at most ${MAX_POLYGON_POINTS} points; this one has ${points.length}`,
    );
  }
  points.forEach(([x, y], i) => {
    if (!Number.isFinite(x) || !Number.isFinite(y)) {
      throw new GeometryError('POLYGON_INVALID', `point ${i + 1} of the face is not a finite [x, y] in mm`);
    }
  });
  const ring = polygonRing(points);
  if (ring.n < 3) {
    throw new GeometryError(
      'POLYGON_INVALID',
      `a polygon face needs at least 3 distinct points; this one has ${ring.n}`,
    );
  }
  const flat = () =>
    new GeometryError('POLYGON_INVALID', 'the face outline encloses no area: its points all lie on one line');
  if (allOnOneLine(ring)) throw flat();
  const fault = firstSelfContact(ring);
  if (fault) throw new GeometryError('POLYGON_INVALID', `the face outline crosses itself: ${fault}`);
  // A simple outline through points not all on one line has area; this only catches float dust.
  if (hasNoArea(ring)) throw flat();
}

/** Every point within a hair (relative to the outline's size) of the line through point 1 and the point farthest from it. */
function allOnOneLine(ring: PolygonRing): boolean {
  const { xs, ys, n } = ring;
  let far = 0;
  let farD2 = 0;
  for (let k = 1; k < n; k++) {
    const d2 = (xs[k]! - xs[0]!) ** 2 + (ys[k]! - ys[0]!) ** 2;
    if (d2 > farD2) [far, farD2] = [k, d2];
  }
  const ux = xs[far]! - xs[0]!;
  const uy = ys[far]! - ys[0]!;
  for (let k = 1; k < n; k++) {
    const cross = ux * (ys[k]! - ys[0]!) - uy * (xs[k]! - xs[0]!);
    if (Math.abs(cross) > 1e-12 * farD2) return false;
  }
  return true;
}

function hasNoArea(ring: PolygonRing): boolean {
  const { xs, ys, n } = ring;
  let twiceArea = 0;
  let minX = Infinity;
  let maxX = -Infinity;
  let minY = Infinity;
  let maxY = -Infinity;
  for (let i = 0, j = n - 1; i < n; j = i++) {
    twiceArea += xs[j]! * ys[i]! - xs[i]! * ys[j]!;
    minX = Math.min(minX, xs[i]!);
    maxX = Math.max(maxX, xs[i]!);
    minY = Math.min(minY, ys[i]!);
    maxY = Math.max(maxY, ys[i]!);
  }
  // Relative to the outline's size, so float noise on collinear points does not count as area.
  const diag2 = (maxX - minX) ** 2 + (maxY - minY) ** 2;
  return Math.abs(twiceArea) <= 1e-12 * diag2;
}

/** Sweeps edges in order of their left end; returns a message for the first contact found. */
function firstSelfContact(ring: PolygonRing): string | null {
  const { xs, ys, n } = ring;
  const box = (v: Float64Array, pick: typeof Math.min) =>
    Float64Array.from({ length: n }, (_, k) => pick(v[k]!, v[(k + 1) % n]!));
  const [loX, hiX, loY, hiY] = [box(xs, Math.min), box(xs, Math.max), box(ys, Math.min), box(ys, Math.max)];
  const order = Array.from({ length: n }, (_, k) => k).sort((p, q) => loX[p]! - loX[q]! || p - q);
  const active: number[] = [];
  for (const e of order) {
    const left = loX[e]!;
    let kept = 0;
    for (const a of active) {
      if (hiX[a]! < left) continue; // ends before this edge starts, and so before all later ones
      active[kept++] = a;
      if (hiY[a]! < loY[e]! || hiY[e]! < loY[a]!) continue;
      const found = edgeContact(ring, Math.min(a, e), Math.max(a, e));
      if (found) return found;
    }
    active.length = kept;
    active.push(e);
  }
  return null;
}

function edgeContact(ring: PolygonRing, a: number, b: number): string | null {
  const { xs, ys, n } = ring;
  const a1 = (a + 1) % n;
  const b1 = (b + 1) % n;
  // Built only on a hit: this runs for every overlapping pair of edges.
  const pair = () => `edges ${edgeName(ring, a)} and ${edgeName(ring, b)}`;
  if (a1 === b || b1 === a) {
    // Neighbours always share a point; they only fault when the outline turns back on itself there.
    const v = a1 === b ? b : a;
    const p = a1 === b ? a : b;
    const q = a1 === b ? b1 : a1;
    return foldsBack(ring, p, v, q) ? `${pair()} overlap near ${at(xs[v]!, ys[v]!)}` : null;
  }
  const hit = segmentContact(xs[a]!, ys[a]!, xs[a1]!, ys[a1]!, xs[b]!, ys[b]!, xs[b1]!, ys[b1]!);
  return hit ? `${pair()} ${hit.kind} near ${at(hit.x, hit.y)}` : null;
}

/** "2–3": the edge from point 2 to point 3, counted from 1 in the caller's list. */
function edgeName(ring: PolygonRing, k: number): string {
  return `${ring.source[k]! + 1}–${ring.source[(k + 1) % ring.n]! + 1}`;
}

function foldsBack(ring: PolygonRing, p: number, v: number, q: number): boolean {
  const { xs, ys } = ring;
  const ux = xs[p]! - xs[v]!;
  const uy = ys[p]! - ys[v]!;
  const wx = xs[q]! - xs[v]!;
  const wy = ys[q]! - ys[v]!;
  return ux * wy - uy * wx === 0 && ux * wx + uy * wy > 0;
}

function at(x: number, y: number): string {
  const show = (c: number) => (Math.abs(c) < 0.05 ? 0 : c).toFixed(1);
  return `(${show(x)}, ${show(y)})`;
}
