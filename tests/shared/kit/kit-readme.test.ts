import { describe, expect, it } from 'vitest';
import { summarizeKit } from '../../../shared/kit';
import { kitReadme } from '../../../shared/kit/kit-readme';
import { kitRequestSchema } from '../../../shared/schemas/kit-request';
import { dovetailBody, squareKeysBody } from './kit-fixtures';

describe('kitReadme', () => {
  it('says how many to print, which way up, the scale, glue, subtraction, the frame and the cautions when the kit has keys', () => {
    const text = kitReadme(
      summarizeKit(
        kitRequestSchema.parse({ ...squareKeysBody, key: { ...squareKeysBody.key, strategy: 'scale', scale: 0.99 } }),
      ),
    );
    expect(text).toMatch(/print 8 keys from key\.stl/);
    expect(text).toMatch(/lying down/);
    expect(text).toMatch(/strongest across the seam/);
    expect(text).toMatch(/scaled to 99 %/);
    expect(text).toMatch(/GLUE/);
    expect(text).toMatch(/boolean difference/);
    expect(text).toMatch(/plane z = 0/);
    expect(text).toMatch(/fumes/);
    expect(text).toMatch(/skin/);
    expect(text).toMatch(/dust mask/);
    expect(text).toMatch(/ventilat/);
    expect(text).toMatch(/load-bearing or safety-critical/);
    expect(text).toMatch(/responsibility/);
    expect(text).toMatch(/local codes/);
  });

  it('explains joining the rails and subtracting the slots when the kit is a dovetail', () => {
    const text = kitReadme(summarizeKit(kitRequestSchema.parse(dovetailBody)));
    expect(text).toMatch(/boolean union/);
    expect(text).toMatch(/subtract slot-cutter-B from half B/);
    expect(text).toMatch(/do not glue it/);
  });
});
