import { describe, expect, it } from 'vitest';
import { calibrationOffsets } from '../../../shared/fit/calibration-offsets';
import { resolveClearance } from '../../../shared/fit/resolve-clearance';

describe('calibrationOffsets', () => {
  it('gives back the measured clearance when the offset is applied', () => {
    const best = { press: { clearancePerSide: 0.05, mark: '2' }, slide: { clearancePerSide: 0.3, mark: '7' } };
    for (const material of ['PLA', 'PETG', 'TPU'] as const) {
      const { results, problems } = calibrationOffsets('fdm', material, best);
      expect(problems).toEqual([]);
      for (const fit of ['press', 'slide'] as const) {
        const calibrationOffset = results[fit]!.offsetMm;
        expect(resolveClearance({ material, fit, calibrationOffset }).clearancePerSide).toBeCloseTo(
          best[fit].clearancePerSide,
          6,
        );
      }
    }
  });

  it('refuses an offset beyond ±0.5 mm with the numbers when the reading is far off', () => {
    // PLA slide on FDM: 0.25 mm published default (shared/fit/clearance-defaults.ts).
    const { problems } = calibrationOffsets('fdm', 'PLA', { slide: { clearancePerSide: 0.8, mark: '9' } });
    expect(problems).toEqual([expect.stringMatching(/^the slide fit came out at 0\.8 mm \(pocket 9\), \+0\.55 mm/)]);
  });
});
