import { describe, expect, it } from 'vitest';
import { defaultProcessFor } from '../../../shared/fit/index';

describe('defaultProcessFor', () => {
  it('returns resin when the material is a resin', () => {
    expect(defaultProcessFor('resin-standard')).toBe('resin');
    expect(defaultProcessFor('resin-tough')).toBe('resin');
  });

  it('returns fdm when the material is a filament', () => {
    for (const material of ['PLA', 'PETG', 'ABS', 'ASA', 'PA', 'TPU'] as const) {
      expect(defaultProcessFor(material)).toBe('fdm');
    }
  });
});
