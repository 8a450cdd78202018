import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { MAX_KEYS } from '../../../shared/geometry/layout';
import { MAX_KEY_COUNT } from '../../../shared/schemas/kit-key-options';
import { kitRequestSchema } from '../../../shared/schemas/kit-request';
import { dovetailRequestArb, keyRequestArb } from '../kit/kit-request-arbitrary';
import { dovetailBody, squareKeysBody } from '../kit/kit-fixtures';

/** Parses a body and returns its issues as "path: message" lines (empty when it is valid). */
function issues(body: unknown): string[] {
  const result = kitRequestSchema.safeParse(body);
  return result.success ? [] : result.error.issues.map((i) => `${i.path.join('.')}: ${i.message}`);
}
const withKey = (key: Record<string, unknown>) => ({ ...squareKeysBody, key: { ...squareKeysBody.key, ...key } });
const withDovetail = (d: Record<string, unknown>) => ({
  ...dovetailBody,
  dovetail: { ...dovetailBody.dovetail, ...d },
});

describe('kitRequestSchema', () => {
  it('fills every default when a minimal key request is valid', () => {
    const r = kitRequestSchema.parse({
      joint: 'key',
      material: 'PLA',
      fit: 'snug',
      face: { shape: 'rect', width: 80, height: 60 },
      key: { shape: 'square', width: 10, depth: 8 },
    });
    expect(r).toMatchObject({ process: 'fdm', format: 'binary', chordTolerance: 0.02 });
    if (r.joint !== 'key') throw new Error('key expected');
    expect(r.key).toMatchObject({
      margin: 2,
      chamfer: 0.4,
      strategy: 'clearance',
      endGap: 0.4,
      bottomGap: 0.2,
      entryChamfer: 0,
      flat: 0,
    });
  });

  it('defaults the slope to 1:6 and resolves its angle when neither slope nor angle is given', () => {
    const r = kitRequestSchema.parse(dovetailBody);
    if (r.joint !== 'dovetail') throw new Error('dovetail expected');
    expect(r.dovetail.slope).toBe(6);
    // arctan(1/6) = 9.4623° (woodworking references, REFERENCES §6).
    expect(r.dovetail.angleDeg).toBeCloseTo(9.4623, 4);
    expect(r.process).toBe('fdm');
  });

  it('takes the process from a resin material when none is given', () => {
    expect(kitRequestSchema.parse({ ...squareKeysBody, material: 'resin-tough' }).process).toBe('resin');
  });

  it('parses a resolved request back to itself when given its own output', () => {
    fc.assert(
      fc.property(fc.oneof(keyRequestArb, dovetailRequestArb), (body) => {
        const once = kitRequestSchema.parse(body);
        expect(kitRequestSchema.parse(once)).toEqual(once);
      }),
      { numRuns: 100 },
    );
  });

  it('caps the key count at the layout maximum of 64 when both define it', () => {
    expect(MAX_KEY_COUNT).toBe(MAX_KEYS);
    expect(issues(withKey({ count: 65 }))).toEqual(['key.count: key count must be at most 64; it is 65']);
  });

  it('rejects negative and zero sizes with the field and the number when a size is not positive', () => {
    expect(issues(withKey({ width: -3 }))).toEqual(['key.width: key width must be at least 1 mm; it is -3 mm']);
    expect(issues(withKey({ depth: 0 }))).toContain('key.depth: key depth must be at least 1 mm; it is 0 mm');
    expect(issues({ ...squareKeysBody, face: { shape: 'rect', width: 0, height: 60 } })[0]).toMatch(
      /^face\.width: face width must be greater than 0 mm/,
    );
    expect(issues(withDovetail({ height: -1 }))).toEqual([
      'dovetail.height: dovetail height must be at least 1 mm; it is -1 mm',
    ]);
  });

  it('rejects NaN, infinities and strings as "must be a number" when a size is not a finite number', () => {
    expect(issues(withKey({ width: Number.NaN }))).toEqual(['key.width: key width must be a number in mm']);
    expect(issues(withKey({ depth: Number.POSITIVE_INFINITY }))).toEqual([
      'key.depth: key depth must be a number in mm',
    ]);
    expect(issues(withKey({ width: '10' }))).toEqual(['key.width: key width must be a number in mm']);
    expect(issues({ ...squareKeysBody, clearance: 'loose' })).toEqual([
      'clearance: clearance per side must be a number in mm',
    ]);
  });

  it('says the chamfer is more than half the key with the numbers when the chamfer is too large', () => {
    expect(issues(withKey({ chamfer: 6 }))).toEqual([
      'key.chamfer: key chamfer 6 mm is more than half the 10 mm key width (5 mm)',
    ]);
    expect(issues(withKey({ shape: 'round', width: 8, flat: 1, chamfer: 3.6 }))).toEqual([
      'key.chamfer: key chamfer 3.6 mm is more than half the 7 mm width across the flat (3.5 mm)',
    ]);
    expect(issues(withKey({ chamfer: 4.5 }))[0]).toMatch(
      /key chamfer 4\.5 mm leaves an end face under 1 mm across .* keep it at most 4 mm/,
    );
  });

  it('rejects an unknown material with the list of materials when the material is not built in', () => {
    expect(issues({ ...squareKeysBody, material: 'wood' })).toEqual([
      'material: material must be one of PLA, PETG, ABS, ASA, PA, TPU, resin-standard, resin-tough',
    ]);
  });

  it('asks for the key object when a key joint has none', () => {
    const { key: _key, ...body } = squareKeysBody as { key: unknown };
    expect(issues(body)).toEqual(['key: a key joint needs a "key" object with shape, width and depth']);
    expect(issues({ ...dovetailBody, dovetail: undefined })).toEqual([
      'dovetail: a dovetail joint needs a "dovetail" object with rootWidth and height',
    ]);
    expect(issues({ ...squareKeysBody, joint: 'biscuit' })).toEqual(['joint: joint must be "key" or "dovetail"']);
  });

  it('rejects a material printed on the other process when both are given', () => {
    expect(issues({ ...squareKeysBody, process: 'resin' })).toEqual([
      'process: PLA is printed on an FDM printer, not resin: set process to "fdm" or choose a resin material',
    ]);
  });

  it('requires length for rect keys and rejects it for the other shapes', () => {
    expect(issues(withKey({ shape: 'rect' }))).toEqual([
      'key.length: a rect key needs "length": its side along y in mm',
    ]);
    expect(issues(withKey({ length: 6 }))[0]).toMatch(/^key\.length: "length" is only for rect keys/);
    expect(issues(withKey({ shape: 'rect', length: 6 }))).toEqual([]);
  });

  it('rejects a scale outside (0.8, 1] and a scale with strategy clearance', () => {
    expect(issues(withKey({ scale: 0.5 }))).toEqual(['key.scale: key scale must be more than 0.8 (80 %); it is 0.5']);
    expect(issues(withKey({ scale: 99 }))[0]).toMatch(
      /key scale must be at most 1 \(100 %; 0\.99 means 99 %\); it is 99/,
    );
    expect(issues(withKey({ strategy: 'clearance', scale: 0.99 }))[0]).toMatch(
      /^key\.scale: key scale applies only with strategy "scale"/,
    );
    expect(kitRequestSchema.parse(withKey({ scale: 0.99 }))).toMatchObject({ key: { strategy: 'scale', scale: 0.99 } });
  });

  it('rejects a depth too shallow for a key with the numbers when depth and end gap leave almost no key', () => {
    expect(issues(withKey({ depth: 1, endGap: 0.4 }))).toEqual([
      'key.depth: key depth 1 mm makes a key 1.6 mm long (2 × 1 mm − 0.4 mm end gap); use a depth of at least 1.2 mm',
    ]);
  });

  it('rejects chamfers and flats finer than a kit file keeps when they are between 0 and 0.02 mm', () => {
    expect(issues(withKey({ chamfer: 0.005 }))).toEqual([
      'key.chamfer: key chamfer 0.005 mm is finer than a kit file keeps (0.02 mm): use 0 for none or at least 0.02 mm',
    ]);
    expect(issues(withKey({ flat: 0.5 }))).toEqual(['key.flat: a flat is only cut on round keys; this key is square']);
  });

  it('rejects a slope outside 1:2…1:20 and an angle that disagrees with the slope', () => {
    expect(issues(withDovetail({ slope: 1 }))).toEqual([
      'dovetail.slope: dovetail slope (the n of 1:n) must be at least 2; it is 1',
    ]);
    expect(issues(withDovetail({ angleDeg: 40 }))).toEqual([
      'dovetail.angleDeg: dovetail angle must be at most 26.57°; it is 40°',
    ]);
    expect(issues(withDovetail({ slope: 6, angleDeg: 14 }))[0]).toMatch(/dovetail slope 1:6 is 9\.462°, not 14°/);
    expect(issues(withDovetail({ slope: 8, angleDeg: 7.125 }))).toEqual([]);
  });

  it('rejects a misspelt option with its name when an options object has an unknown key', () => {
    expect(issues(withKey({ chamfre: 1 }))).toEqual(['key: unknown key option "chamfre": check the spelling']);
  });

  it('caps polygon faces at 1000 points when a request sends 10,000', () => {
    const points = Array.from({ length: 10_000 }, (_, i) => [Math.cos(i), Math.sin(i)]);
    expect(issues({ ...squareKeysBody, face: { shape: 'polygon', points } })).toEqual([
      'face.points: a polygon face may have at most 1000 points',
    ]);
  });
});
