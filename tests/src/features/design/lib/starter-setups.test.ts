import { describe, expect, it } from 'vitest';
import { buildKit } from '../../../../../shared/kit/build-kit';
import { kitRequestSchema } from '../../../../../shared/schemas/kit-request';
import { STARTER_SETUPS } from '../../../../../src/features/design/lib/starter-setups';

describe('STARTER_SETUPS', () => {
  it.each(STARTER_SETUPS.map((s) => [s.name, s] as const))(
    '%s builds a kit with the keys or rails it promises',
    (_, s) => {
      const request = kitRequestSchema.parse({ ...s.settings, face: s.face });
      const kit = buildKit(request);
      const count = s.settings.joint === 'key' ? s.settings.key.count : s.settings.dovetail.count;
      const part = kit.manifest.parts.find((p) => p.role === 'key' || p.role === 'rail')!;
      expect(part.role === 'key' ? part.quantity : part.positions?.length).toBe(count);
      expect(kit.manifest.warnings).toEqual([]);
    },
  );
});
