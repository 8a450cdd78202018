import { describe, expect, it } from 'vitest';
import { kitRequestSchema } from '../../../../../shared/schemas/kit-request';
import { DEFAULT_DESIGN, toKitRequest } from '../../../../../src/features/design/lib/design-values';

describe('toKitRequest', () => {
  it('gives a valid key request for the default design', () => {
    const request = toKitRequest(DEFAULT_DESIGN);
    expect(kitRequestSchema.safeParse(request).success).toBe(true);
    expect(request).not.toHaveProperty('dovetail');
    expect(request).not.toHaveProperty('clearance');
  });

  it('drops settings that do not apply to the chosen shape, strategy and clearance mode', () => {
    const request = toKitRequest({
      ...DEFAULT_DESIGN,
      clearanceMode: 'set',
      clearance: 0.2,
      face: { ...DEFAULT_DESIGN.face, shape: 'circle', diameter: 70 },
      key: { ...DEFAULT_DESIGN.key, shape: 'round', length: 12, flat: 0.5, scale: 0.98, strategy: 'clearance' },
    });
    expect(request).toMatchObject({ clearance: 0.2, face: { shape: 'circle', diameter: 70 } });
    expect(request.face).not.toHaveProperty('width');
    expect(request).toHaveProperty('key.flat', 0.5);
    expect(request).not.toHaveProperty('key.length');
    expect(request).not.toHaveProperty('key.scale');
    expect(kitRequestSchema.safeParse(request).success).toBe(true);
  });

  it('gives a valid dovetail request when the joint is a dovetail', () => {
    const request = toKitRequest({ ...DEFAULT_DESIGN, joint: 'dovetail' });
    expect(request).not.toHaveProperty('key');
    expect(kitRequestSchema.parse(request)).toMatchObject({ joint: 'dovetail', dovetail: { count: 3, slope: 6 } });
  });
});
