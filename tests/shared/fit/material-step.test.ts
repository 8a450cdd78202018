import { describe, expect, it } from 'vitest';
import { materialStep } from '../../../shared/fit/material-step';
import { materialAdjustments } from '../../../shared/fit/material-adjustments';

describe('materialStep', () => {
  it('returns nothing when a built-in material has no adjustment', () => {
    expect(materialStep('PLA')).toBeNull();
  });

  it('names the built-in material with its adjustment and source when it has one', () => {
    expect(materialStep('PETG')).toEqual({
      step: { label: 'for PETG', mm: materialAdjustments.PETG.mm, source: 'common practice' },
      words: '+0.02 mm for PETG',
    });
  });

  it('uses the team material’s adjustment and names it with its base when a tuning is given', () => {
    const step = materialStep('PETG', { name: 'Clear PETG', clearanceAdjustment: -0.04 });
    expect(step?.words).toBe('−0.04 mm for Clear PETG (a team material based on PETG)');
    expect(step?.step.mm).toBe(-0.04);
    expect(step?.step.source).toBe('the team’s own adjustment for Clear PETG, in place of PETG’s');
  });

  it('names the team material when its adjustment is 0', () => {
    expect(materialStep('PLA', { name: 'Grey matte PLA', clearanceAdjustment: 0 })?.words).toBe(
      '±0 mm for Grey matte PLA (a team material based on PLA)',
    );
  });
});
