import { describe, expect, it } from 'vitest';
import { offsetConvexPolygon } from '../../../../shared/geometry/section/offset-convex-polygon';
import type { Vec2 } from '../../../../shared/geometry/units';

const square: Vec2[] = [
  [0, 0],
  [10, 0],
  [10, 10],
  [0, 10],
];

function edgeDistance(a: readonly Vec2[], b: readonly Vec2[], i: number): number {
  // Distance from edge i of `b` to the line of edge i of `a`, along a's outward normal.
  const p = a[i]!;
  const q = a[(i + 1) % a.length]!;
  const len = Math.hypot(q[0] - p[0], q[1] - p[1]);
  const n = [(q[1] - p[1]) / len, -(q[0] - p[0]) / len];
  return (b[i]![0] - p[0]) * n[0]! + (b[i]![1] - p[1]) * n[1]!;
}

describe('offsetConvexPolygon', () => {
  it('grows a square by the offset on every side when the offset is positive', () => {
    const out = offsetConvexPolygon(square, 0.2);
    expect(out[0]![0]).toBeCloseTo(-0.2, 12);
    expect(out[2]![1]).toBeCloseTo(10.2, 12);
  });

  it('moves every edge by exactly its own distance when the distances differ per edge', () => {
    const trapezoid: Vec2[] = [
      [-5, 0],
      [5, 0],
      [6, 6],
      [-6, 6],
    ];
    const d = [1, 0.15, 0.3, 0.15];
    const out = offsetConvexPolygon(trapezoid, d);
    for (let i = 0; i < 4; i++) expect(edgeDistance(trapezoid, out, i)).toBeCloseTo(d[i]!, 12);
  });

  it('keeps every edge parallel to the original when a regular polygon is inset', () => {
    const hex = Array.from({ length: 6 }, (_, k) => [Math.cos((k * Math.PI) / 3), Math.sin((k * Math.PI) / 3)] as Vec2);
    const out = offsetConvexPolygon(hex, -0.1);
    for (let i = 0; i < 6; i++) {
      const a = [hex[(i + 1) % 6]![0] - hex[i]![0], hex[(i + 1) % 6]![1] - hex[i]![1]];
      const b = [out[(i + 1) % 6]![0] - out[i]![0], out[(i + 1) % 6]![1] - out[i]![1]];
      expect(a[0]! * b[1]! - a[1]! * b[0]!).toBeCloseTo(0, 12);
      expect(edgeDistance(hex, out, i)).toBeCloseTo(-0.1, 12);
    }
  });
});
