import { describe, expect, it } from 'vitest';
import { profileCalibration } from '../../../shared/library/profile-calibration';
import { teamMaterialTuning } from '../../../shared/library/team-material-tuning';

const profile = {
  name: 'Corner FDM',
  calibration: [
    { material: 'PLA', fit: 'snug', offsetMm: -0.03, measuredOn: '2026-11-02', source: 'fit test' },
    { material: 'PETG', fit: 'slide', offsetMm: 0.04, measuredOn: '2026-11-03', source: 'entered by hand' },
  ],
} as const;

describe('profileCalibration', () => {
  it('finds the entry for the material and fit class and names the profile', () => {
    expect(profileCalibration(profile as never, 'PLA', 'snug')).toEqual({
      offsetMm: -0.03,
      source: 'the calibration of printer profile "Corner FDM" (PLA snug, fit test on 2026-11-02)',
    });
    expect(profileCalibration(profile as never, 'PLA', 'slide')).toBeNull();
  });

  it('keeps the source within the 200 characters a kit request allows', () => {
    const long = { ...profile, name: 'x'.repeat(120) };
    expect(profileCalibration(long as never, 'PETG', 'slide')!.source.length).toBeLessThanOrEqual(200);
  });
});

describe('teamMaterialTuning', () => {
  it('takes the adjustment of the fit class, 0 when a stored row lacks it', () => {
    const material = { name: 'Chalk-white PLA', clearanceAdjustments: { press: 0.01, snug: 0.05 } };
    expect(teamMaterialTuning(material as never, 'snug')).toEqual({
      name: 'Chalk-white PLA',
      clearanceAdjustment: 0.05,
    });
    expect(teamMaterialTuning(material as never, 'slide').clearanceAdjustment).toBe(0);
  });
});
