import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import type { FitClass, Material } from '../../../shared/schemas/joint-options';
import { clearanceDefaults, defaultProcessFor, resolveClearance } from '../../../shared/fit/index';

const fits: FitClass[] = ['press', 'snug', 'slide'];
const materials: Material[] = ['PLA', 'PETG', 'ABS', 'ASA', 'PA', 'TPU', 'resin-standard', 'resin-tough'];
// Whole micrometres within the schema's bounds (±0.5 mm), so sums can be checked exactly.
const umWithin = fc.integer({ min: -500, max: 500 });
const toUm = (mm: number) => Math.round(mm * 1000);
const grey = (clearanceAdjustment: number) => ({ name: 'Grey matte PLA', clearanceAdjustment });

describe('resolveClearance with a team material', () => {
  it('names the team material and its base in the derivation when PLA is tuned for a snug fit', () => {
    const result = resolveClearance({ material: 'PLA', fit: 'snug', materialTuning: grey(0.03) });
    // PLA snug on FDM: 0.16 mm default (shared/fit/clearance-defaults.ts), +0.03 mm the team's own.
    expect(result.clearancePerSide).toBe(0.19);
    expect(result.derivation).toBe(
      '0.19 mm: snug fit in PLA on FDM, 0.16 mm from the published 0.1–0.3 mm range, +0.03 mm for Grey matte PLA (a team material based on PLA)',
    );
    expect(result.steps.map((s) => s.mm)).toEqual([0.16, 0.03]);
    expect(result.steps[1]?.label).toBe('for Grey matte PLA (a team material based on PLA)');
  });

  it('replaces the built-in adjustment when the base material has one of its own', () => {
    const tuned = resolveClearance({
      material: 'PETG',
      fit: 'press',
      materialTuning: { name: 'Clear PETG', clearanceAdjustment: -0.01 },
    });
    // PETG's built-in +0.02 mm (common practice) is gone; only the team's −0.01 mm is added to 0.1 mm.
    expect(tuned.clearancePerSide).toBe(0.09);
    expect(tuned.derivation).not.toContain('for PETG,');
    expect(tuned.derivation).toContain('−0.01 mm for Clear PETG (a team material based on PETG)');
  });

  it('still names the team material when its adjustment is 0', () => {
    const result = resolveClearance({ material: 'PLA', fit: 'slide', materialTuning: grey(0) });
    expect(result.clearancePerSide).toBe(0.25);
    expect(result.derivation).toContain('±0 mm for Grey matte PLA (a team material based on PLA)');
    expect(result.steps).toHaveLength(2);
  });

  it('puts the team material before the calibration when both are given', () => {
    const result = resolveClearance({
      material: 'PLA',
      fit: 'snug',
      materialTuning: grey(0.03),
      calibrationOffset: -0.03,
      calibrationSource: "your printer's fit test",
    });
    expect(result.clearancePerSide).toBe(0.16);
    expect(result.derivation).toMatch(/\+0\.03 mm for Grey matte PLA .*, your printer's fit test −0\.03 mm$/);
  });

  it('ignores the team material when an explicit clearance is given', () => {
    const result = resolveClearance({ material: 'PLA', fit: 'snug', clearance: 0.2, materialTuning: grey(0.3) });
    expect(result.clearancePerSide).toBe(0.2);
    expect(result.derivation).not.toContain('Grey matte PLA');
  });

  it('throws a RangeError when the team material’s adjustment is not a finite number', () => {
    expect(() => resolveClearance({ material: 'PLA', fit: 'snug', materialTuning: grey(Number.NaN) })).toThrow(
      /clearance adjustment of Grey matte PLA must be a finite number/,
    );
  });

  it('equals the published default plus the tuning plus the calibration, floored at 0, for any inputs', () => {
    fc.assert(
      fc.property(
        fc.constantFrom(...materials),
        fc.constantFrom(...fits),
        umWithin,
        fc.option(umWithin, { nil: undefined }),
        (material, fit, tuningUm, offsetUm) => {
          const result = resolveClearance({
            material,
            fit,
            materialTuning: { name: 'Studio spool', clearanceAdjustment: tuningUm / 1000 },
            calibrationOffset: offsetUm === undefined ? undefined : offsetUm / 1000,
          });
          const base = clearanceDefaults[defaultProcessFor(material)][fit].mm;
          // Integer micrometres: an independent check of the arithmetic and of the floor at 0.
          expect(toUm(result.clearancePerSide)).toBe(Math.max(0, toUm(base) + tuningUm + (offsetUm ?? 0)));
          expect(result.clearancePerSide).toBeGreaterThanOrEqual(0);
        },
      ),
    );
  });

  it('has steps that add up to the result when a team material is chosen', () => {
    fc.assert(
      fc.property(
        fc.constantFrom(...materials),
        fc.constantFrom(...fits),
        fc.double({ min: -0.5, max: 0.5, noNaN: true }),
        fc.option(fc.double({ min: -0.5, max: 0.5, noNaN: true }), { nil: undefined }),
        (material, fit, tuning, calibrationOffset) => {
          const result = resolveClearance({
            material,
            fit,
            materialTuning: { name: 'Studio spool', clearanceAdjustment: tuning },
            calibrationOffset,
          });
          const sum = result.steps.reduce((total, step) => total + step.mm, 0);
          // The result is rounded to 0.001 mm; the steps carry the unrounded inputs.
          expect(Math.abs(sum - result.clearancePerSide)).toBeLessThanOrEqual(0.0005 + 1e-9);
          expect(result.derivation).toContain('Studio spool');
        },
      ),
    );
  });
});
