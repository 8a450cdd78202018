import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { GeometryError } from '../../../../shared/geometry/geometry-error';
import { MAX_KEYS, MIN_STAGGER_MM, placeKeys, type Footprint } from '../../../../shared/geometry/layout';
import type { Face } from '../../../../shared/schemas/face';
import { countArb, faceArb, footprintArb, marginArb } from './layout-arbitraries';
import { oracleGap, oracleWall, oracleWidth } from './layout-oracle';

type Request = { face: Face; footprint: Footprint; margin: number; count: number | undefined };
const requestArb: fc.Arbitrary<Request> = fc.record({
  face: faceArb,
  footprint: footprintArb,
  margin: marginArb,
  count: countArb,
});
const EXPECTED_CODES = ['FACE_TOO_SMALL', 'TOO_MANY_KEYS', 'NO_ROOM_FOR_KEYS'];

function attempt(r: Request): Array<[number, number]> | GeometryError {
  try {
    return placeKeys({ ...r, keyLabel: 'the key' });
  } catch (e) {
    if (e instanceof GeometryError) return e;
    throw e;
  }
}

/** Largest wall the oracle finds on a 60 × 60 sample of the face's box, mm. */
function sampledBestWall(r: Request): number {
  const box =
    r.face.shape === 'rect'
      ? [-r.face.width / 2, r.face.width / 2, -r.face.height / 2, r.face.height / 2]
      : r.face.shape === 'circle'
        ? [-r.face.diameter / 2, r.face.diameter / 2, -r.face.diameter / 2, r.face.diameter / 2]
        : [
            Math.min(...r.face.points.map((p) => p[0])),
            Math.max(...r.face.points.map((p) => p[0])),
            Math.min(...r.face.points.map((p) => p[1])),
            Math.max(...r.face.points.map((p) => p[1])),
          ];
  let best = -Infinity;
  for (let i = 0; i <= 60; i++) {
    for (let j = 0; j <= 60; j++) {
      const p: [number, number] = [box[0]! + ((box[1]! - box[0]!) * i) / 60, box[2]! + ((box[3]! - box[2]!) * j) / 60];
      best = Math.max(best, oracleWall(r.face, r.footprint, p));
    }
  }
  return best;
}

describe('placeKeys', () => {
  it('keeps every wall, never overlaps and honours the count when the request is anything valid', () => {
    fc.assert(
      fc.property(requestArb, (r) => {
        const out = attempt(r);
        if (out instanceof GeometryError) {
          expect(EXPECTED_CODES).toContain(out.code);
          // "Nothing fits" must be true: an independent sample of the face finds no spot either.
          // A face exactly at the limit (within 0.1 µm) may go either way: the layout keeps a hair of tolerance.
          if (out.code === 'FACE_TOO_SMALL') expect(sampledBestWall(r)).toBeLessThan(r.margin + 1e-4);
          return;
        }
        if (r.count !== undefined) expect(out).toHaveLength(r.count);
        else expect(out.length).toBeGreaterThanOrEqual(1);
        expect(out.length).toBeLessThanOrEqual(MAX_KEYS);
        for (const k of out) expect(oracleWall(r.face, r.footprint, k)).toBeGreaterThanOrEqual(r.margin - 1e-6);
        for (let i = 0; i < out.length; i++) {
          for (let j = i + 1; j < out.length; j++) {
            expect(oracleGap(r.footprint, out[i]!, out[j]!)).toBeGreaterThanOrEqual(r.margin - 1e-6);
          }
        }
        if (out.length >= 3) expect(oracleWidth(out)).toBeGreaterThanOrEqual(MIN_STAGGER_MM - 1e-9);
      }),
      { numRuns: 150 },
    );
  });

  it('gives exactly the same answer when called again with the same request', () => {
    fc.assert(
      fc.property(requestArb, (r) => {
        const first = attempt(r);
        const second = attempt(r);
        if (first instanceof GeometryError) {
          expect(second).toBeInstanceOf(GeometryError);
          expect((second as GeometryError).message).toBe(first.message);
        } else {
          expect(second).toEqual(first);
        }
      }),
      { numRuns: 60 },
    );
  });

  it('places the same number again when asked for as many as it placed with count omitted', () => {
    fc.assert(
      fc.property(requestArb, (r) => {
        const all = attempt({ ...r, count: undefined });
        if (all instanceof GeometryError) return;
        const again = attempt({ ...r, count: all.length });
        expect(again).not.toBeInstanceOf(GeometryError);
        expect(again).toHaveLength(all.length);
      }),
      { numRuns: 60 },
    );
  });

  it('can place the number it says fit when it refuses a count as too many', () => {
    fc.assert(
      fc.property(requestArb, fc.integer({ min: 2, max: MAX_KEYS }), (r, count) => {
        const out = attempt({ ...r, count });
        if (!(out instanceof GeometryError) || out.code !== 'TOO_MANY_KEYS') return;
        const fit = Number(/^only (\d+) keys? fits?/.exec(out.message)?.[1]);
        expect(fit).toBeGreaterThanOrEqual(1);
        expect(fit).toBeLessThan(count);
        const retry = attempt({ ...r, count: fit });
        if (retry instanceof GeometryError) expect(retry.code).toBe('NO_ROOM_FOR_KEYS');
        else expect(retry).toHaveLength(fit);
      }),
      { numRuns: 60 },
    );
  });
});
