import { describe, expect, it } from 'vitest';
import { buildKit } from '../../../shared/kit/build-kit';
import { kitRequestSchema, materialTuningSchema } from '../../../shared/schemas/kit-request';
import { dovetailBody, squareKeysBody } from '../kit/kit-fixtures';

/** Parses a body and returns its issues as "path: message" lines (empty when it is valid). */
function issues(body: unknown): string[] {
  const result = kitRequestSchema.safeParse(body);
  return result.success ? [] : result.error.issues.map((i) => `${i.path.join('.')}: ${i.message}`);
}
const tuned = (materialTuning: unknown) => ({ ...squareKeysBody, materialTuning });

describe('materialTuningSchema', () => {
  it('trims the name when a team material is given', () => {
    expect(materialTuningSchema.parse({ name: '  Grey matte PLA ', clearanceAdjustment: 0.03 })).toEqual({
      name: 'Grey matte PLA',
      clearanceAdjustment: 0.03,
    });
  });

  it('accepts the bounds when the adjustment is exactly ±0.5 mm', () => {
    expect(issues(tuned({ name: 'A', clearanceAdjustment: -0.5 }))).toEqual([]);
    expect(issues(tuned({ name: 'A', clearanceAdjustment: 0.5 }))).toEqual([]);
    expect(issues(tuned({ name: 'x'.repeat(80), clearanceAdjustment: 0 }))).toEqual([]);
  });

  it('refuses in plain words naming the field when the adjustment is out of bounds or not a number', () => {
    expect(issues(tuned({ name: 'A', clearanceAdjustment: 0.51 }))).toEqual([
      'materialTuning.clearanceAdjustment: materialTuning clearance adjustment must be at most 0.5 mm; it is 0.51 mm',
    ]);
    expect(issues(tuned({ name: 'A', clearanceAdjustment: -0.6 }))).toEqual([
      'materialTuning.clearanceAdjustment: materialTuning clearance adjustment must be at least -0.5 mm; it is -0.6 mm',
    ]);
    expect(issues(tuned({ name: 'A', clearanceAdjustment: 'x' }))).toEqual([
      'materialTuning.clearanceAdjustment: materialTuning clearance adjustment must be a number in mm',
    ]);
    expect(issues(tuned({ name: 'A' }))).toEqual([
      'materialTuning.clearanceAdjustment: materialTuning clearance adjustment is required',
    ]);
  });

  it('refuses a name that is blank, too long or not text', () => {
    expect(issues(tuned({ name: '   ', clearanceAdjustment: 0 }))).toEqual([
      'materialTuning.name: materialTuning name must not be empty: give the team material’s name',
    ]);
    expect(issues(tuned({ name: 'x'.repeat(81), clearanceAdjustment: 0 }))).toEqual([
      'materialTuning.name: materialTuning name must be at most 80 characters; it has 81',
    ]);
    expect(issues(tuned({ name: 7, clearanceAdjustment: 0 }))).toEqual([
      'materialTuning.name: materialTuning name must be text: the name of a team material',
    ]);
    expect(issues(tuned('Grey'))).toEqual([
      'materialTuning: materialTuning must be an object with a name and a clearanceAdjustment in mm',
    ]);
  });
});

describe('kitRequestSchema', () => {
  it('keeps materialTuning when a team material is given, and leaves it out otherwise', () => {
    const r = kitRequestSchema.parse({
      ...dovetailBody,
      materialTuning: { name: 'Clear PETG', clearanceAdjustment: 0 },
    });
    expect(r.materialTuning).toEqual({ name: 'Clear PETG', clearanceAdjustment: 0 });
    expect('materialTuning' in kitRequestSchema.parse(squareKeysBody)).toBe(false);
  });

  it('parses a resolved request with materialTuning to itself, so a stored kit rebuilds the same', () => {
    const r = kitRequestSchema.parse(tuned({ name: 'Grey matte PLA', clearanceAdjustment: 0.03 }));
    expect(kitRequestSchema.parse(JSON.parse(JSON.stringify(r)))).toEqual(r);
  });
});

describe('buildKit', () => {
  it('echoes materialTuning in the manifest and names the team material when the request carries one', () => {
    const tuning = { name: 'Grey matte PLA', clearanceAdjustment: 0.03 };
    const { manifest } = buildKit(kitRequestSchema.parse(tuned(tuning)));
    expect(manifest.request.materialTuning).toEqual(tuning);
    // PLA snug on FDM: 0.16 mm default (shared/fit/clearance-defaults.ts) + 0.03 mm.
    expect(manifest.clearancePerSide).toBe(0.19);
    expect(manifest.fit.derivation).toContain('+0.03 mm for Grey matte PLA (a team material based on PLA)');
  });

  it('passes materialTuning to the fit engine when the joint is a dovetail', () => {
    const plain = buildKit(kitRequestSchema.parse(dovetailBody)).manifest;
    const tuning = { name: 'Clear PETG', clearanceAdjustment: 0.05 };
    const { manifest } = buildKit(kitRequestSchema.parse({ ...dovetailBody, materialTuning: tuning }));
    // PETG's built-in +0.02 mm (common practice) is replaced by the team's +0.05 mm.
    expect(manifest.clearancePerSide).toBeCloseTo(plain.clearancePerSide + 0.03, 9);
    expect(manifest.fit.derivation).toContain('Clear PETG (a team material based on PETG)');
  });
});
