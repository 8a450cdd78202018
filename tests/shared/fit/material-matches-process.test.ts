import { describe, expect, it } from 'vitest';
import { materialMatchesProcess } from '../../../shared/fit/index';

describe('materialMatchesProcess', () => {
  it('accepts a material when it is printed by its own process', () => {
    expect(materialMatchesProcess('PLA', 'fdm')).toBe(true);
    expect(materialMatchesProcess('TPU', 'fdm')).toBe(true);
    expect(materialMatchesProcess('resin-tough', 'resin')).toBe(true);
  });

  it('rejects a material when the process is the other one', () => {
    expect(materialMatchesProcess('PLA', 'resin')).toBe(false);
    expect(materialMatchesProcess('resin-standard', 'fdm')).toBe(false);
  });
});
