import { describe, expect, it } from 'vitest';
import { presetSettingsSchema } from '../../../shared/schemas/preset-settings';
import { presetInputSchema } from '../../../shared/schemas/preset';

const key = { joint: 'key', material: 'PLA', fit: 'snug', key: { shape: 'square', width: 10, depth: 8 } };

describe('presetSettingsSchema', () => {
  it('applies the kit request’s defaults and leaves no face', () => {
    const s = presetSettingsSchema.parse({ ...key, face: { shape: 'circle', diameter: 50 } });
    expect(s).toMatchObject({
      process: 'fdm',
      format: 'binary',
      chordTolerance: 0.02,
      key: { chamfer: 0.4, strategy: 'clearance' },
    });
    expect('face' in s).toBe(false);
  });

  it('parses its own output to itself', () => {
    const once = presetSettingsSchema.parse({
      joint: 'dovetail',
      material: 'resin-standard',
      fit: 'press',
      dovetail: { rootWidth: 8, height: 4 },
    });
    expect(presetSettingsSchema.parse(once)).toEqual(once);
  });

  it('reports the kit request’s messages with their paths', () => {
    const r = presetSettingsSchema.safeParse({ ...key, material: 'PLA', process: 'resin' });
    expect(r.success).toBe(false);
    expect(r.error?.issues[0]?.path).toEqual(['process']);
    expect(presetSettingsSchema.safeParse('key').error?.issues[0]?.message).toMatch(/must be an object/);
  });
});

describe('presetInputSchema', () => {
  it('trims the name, lower-cases and de-duplicates tags, and defaults the rest', () => {
    const p = presetInputSchema.parse({ name: '  Wing spar  ', tags: ['Wing', 'wing', 'long part'], settings: key });
    expect(p).toMatchObject({
      name: 'Wing spar',
      tags: ['wing', 'long part'],
      description: '',
      printerProfileId: null,
    });
  });

  it('refuses a tag with punctuation and more than 12 tags', () => {
    expect(presetInputSchema.safeParse({ name: 'x', tags: ['a;b'], settings: key }).success).toBe(false);
    expect(
      presetInputSchema.safeParse({ name: 'x', tags: Array.from({ length: 13 }, (_, i) => `t${i}`), settings: key })
        .success,
    ).toBe(false);
  });
});
