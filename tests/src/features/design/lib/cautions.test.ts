import { describe, expect, it } from 'vitest';
import { kitRequestSchema } from '../../../../../shared/schemas/kit-request';
import { cautionsFor } from '../../../../../src/features/design/lib/cautions';

const base = { face: { shape: 'rect', width: 80, height: 60 }, key: { shape: 'square', width: 10, depth: 8 } } as const;

describe('cautionsFor', () => {
  it('names resin handling, glue fumes, small parts and strength when resin keys are glued', () => {
    const ids = cautionsFor(
      kitRequestSchema.parse({ ...base, joint: 'key', material: 'resin-standard', fit: 'snug' }),
    ).map((c) => c.id);
    expect(ids).toEqual(['resin', 'glue', 'sanding', 'small-parts', 'load']);
  });

  it('leaves out glue and small parts when a dovetail slides', () => {
    const request = kitRequestSchema.parse({
      joint: 'dovetail',
      material: 'ABS',
      fit: 'slide',
      face: base.face,
      dovetail: { rootWidth: 10, height: 6 },
    });
    expect(cautionsFor(request).map((c) => c.id)).toEqual(['fumes', 'sanding', 'load']);
  });
});
