import { describe, expect, it } from 'vitest';
import { defaultKeyChamfer, narrowestWidth } from '../../../shared/schemas/kit-key-checks';
import type { KeyFields } from '../../../shared/schemas/kit-key-options';

const key = (over: Partial<KeyFields>): KeyFields => ({
  shape: 'square',
  width: 10,
  depth: 8,
  margin: 2,
  endGap: 0.4,
  entryChamfer: 0,
  flat: 0,
  ...over,
});

describe('narrowestWidth', () => {
  it('names the length when a rect key is narrower along y', () => {
    expect(narrowestWidth(key({ shape: 'rect', length: 6 }))).toEqual({ size: 6, words: 'key length' });
  });

  it('measures across the flat when a round key has one', () => {
    expect(narrowestWidth(key({ shape: 'round', width: 8, flat: 1 }))).toEqual({
      size: 7,
      words: 'width across the flat',
    });
  });
});

describe('defaultKeyChamfer', () => {
  it('is 0.4 mm when the key is roomy and smaller when the key is tiny or short', () => {
    expect(defaultKeyChamfer(key({}))).toBe(0.4);
    expect(defaultKeyChamfer(key({ width: 2 }))).toBe(0.2);
    expect(defaultKeyChamfer(key({ depth: 1.3 }))).toBe(0.27);
  });
});
