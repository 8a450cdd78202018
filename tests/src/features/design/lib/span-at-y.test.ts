import { describe, expect, it } from 'vitest';
import { spanAtY } from '../../../../../src/features/design/lib/span-at-y';

const square: Array<[number, number]> = [
  [-5, -5],
  [5, -5],
  [5, 5],
  [-5, 5],
];

describe('spanAtY', () => {
  it('gives the full width when the line crosses a square through its centre', () => {
    expect(spanAtY(square, 0)).toEqual([-5, 5]);
  });

  it('gives both ends of an edge when the line runs along it', () => {
    expect(spanAtY(square, 5)).toEqual([-5, 5]);
  });

  it('interpolates the chord when the outline is a diamond, in either winding', () => {
    const diamond: Array<[number, number]> = [
      [0, -4],
      [4, 0],
      [0, 4],
      [-4, 0],
    ];
    expect(spanAtY(diamond, 2)).toEqual([-2, 2]);
    expect(spanAtY(diamond.toReversed(), -1)).toEqual([-3, 3]);
  });

  it('gives NaN when the line misses the outline', () => {
    expect(spanAtY(square, 6)).toEqual([NaN, NaN]);
  });
});
