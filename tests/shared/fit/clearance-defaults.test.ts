import { describe, expect, it } from 'vitest';
import { clearanceDefaults, materialAdjustments } from '../../../shared/fit/index';

describe('clearanceDefaults', () => {
  it('lies inside the published FDM ranges when the process is FDM', () => {
    const { press, snug, slide } = clearanceDefaults.fdm;
    // printparams.com "Designing for real-world fit" and novalab3d: press / tight 0.1–0.15 mm per side
    expect(press.mm).toBeGreaterThanOrEqual(0.1);
    expect(press.mm).toBeLessThanOrEqual(0.15);
    // printparams; novalab3d; x3dstudios: sliding 0.2–0.3 mm per side
    expect(slide.mm).toBeGreaterThanOrEqual(0.2);
    expect(slide.mm).toBeLessThanOrEqual(0.3);
    // snug lies between press and sliding: inside printparams' press low end (0.1) to sliding high end (0.3)
    expect(snug.mm).toBeGreaterThanOrEqual(0.1);
    expect(snug.mm).toBeLessThanOrEqual(0.3);
  });

  it('lies inside the published resin ranges when the process is resin', () => {
    const { press, snug, slide } = clearanceDefaults.resin;
    // hycubeworks.in design guide: SLA tight < 0.15 mm
    expect(press.mm).toBeGreaterThan(0);
    expect(press.mm).toBeLessThan(0.15);
    // hycubeworks.in design guide: SLA loose > 0.3 mm
    expect(slide.mm).toBeGreaterThan(0.3);
    // between hycubeworks.in tight (< 0.15) and loose (> 0.3)
    expect(snug.mm).toBeGreaterThanOrEqual(0.15);
    expect(snug.mm).toBeLessThanOrEqual(0.3);
  });

  it('orders press < snug < slide when the process is fixed', () => {
    // common practice (REFERENCES, facts of the trade): a removable fit needs more gap than a permanent one
    for (const process of ['fdm', 'resin'] as const) {
      const { press, snug, slide } = clearanceDefaults[process];
      expect(press.mm).toBeLessThan(snug.mm);
      expect(snug.mm).toBeLessThan(slide.mm);
    }
  });

  it('keeps every default inside the range it declares when the range is read back', () => {
    for (const process of ['fdm', 'resin'] as const) {
      for (const entry of Object.values(clearanceDefaults[process])) {
        expect(entry.mm).toBeGreaterThanOrEqual(entry.range.min ?? 0);
        expect(entry.mm).toBeLessThanOrEqual(entry.range.max ?? Infinity);
      }
    }
  });

  it('keeps every default with its material adjustment inside the published 0.1–0.5 mm envelope when printed on FDM', () => {
    // REFERENCES §7.2: the "0.1–0.5 mm per side" envelope, the union of the published ranges
    for (const entry of Object.values(clearanceDefaults.fdm)) {
      for (const adjustment of Object.values(materialAdjustments)) {
        expect(entry.mm + adjustment.mm).toBeGreaterThanOrEqual(0.1);
        expect(entry.mm + adjustment.mm).toBeLessThanOrEqual(0.5);
      }
    }
  });
});
