import { describe, expect, it } from 'vitest';
import { mergeCalibration } from '../../../../server/modules/fit-tests/merge-calibration';

describe('mergeCalibration', () => {
  const old = [
    { material: 'PLA', fit: 'snug', offsetMm: -0.03, measuredOn: '2026-01-12', source: 'entered by hand' },
    { material: 'PLA', fit: 'press', offsetMm: 0.01, measuredOn: '2026-01-12', source: 'entered by hand' },
    { material: 'PETG', fit: 'press', offsetMm: 0.02, measuredOn: '2026-01-12', source: 'entered by hand' },
  ] as const;

  it('replaces only the measured classes of the material when a class is missing', () => {
    const merged = mergeCalibration(
      old,
      'PLA',
      { press: { clearancePerSide: 0.05, publishedDefault: 0.1, offsetMm: -0.05, mark: '2' } },
      '2026-02-01',
      'fit test x',
    );
    expect(merged).toEqual([
      old[0],
      old[2],
      { material: 'PLA', fit: 'press', offsetMm: -0.05, measuredOn: '2026-02-01', source: 'fit test x' },
    ]);
  });
});
