import { describe, expect, it } from 'vitest';
import { teamMaterialInputSchema, type TeamMaterial } from '../../../../../shared/schemas/material';
import { materialChanges, materialFormValues } from '../../../../../src/features/materials/lib/material-changes';

const grey: TeamMaterial = {
  id: '7f1d2a3e-0000-4000-8000-000000000001',
  name: 'Grey matte PLA',
  baseMaterial: 'PLA',
  process: 'fdm',
  shrinkagePercent: null,
  clearanceAdjustments: { press: 0, snug: 0.03, slide: 0 },
  notes: '',
  createdAt: '2026-01-12T10:00:00.000Z',
  updatedAt: '2026-01-12T10:00:00.000Z',
  updatedBy: null,
};
const edit = (changes: Record<string, unknown>) =>
  teamMaterialInputSchema.parse({ ...materialFormValues(grey), ...changes });

describe('materialChanges', () => {
  it('returns an empty patch when nothing changed', () => {
    expect(materialChanges(grey, edit({ name: '  Grey matte PLA ' }))).toEqual({});
  });

  it('sends only the fit classes whose adjustment changed, so another edit of the others is kept', () => {
    expect(materialChanges(grey, edit({ clearanceAdjustments: { press: 0, snug: 0.05, slide: 0 } }))).toEqual({
      clearanceAdjustments: { snug: 0.05 },
    });
  });

  it('sends only the fields that changed when several did', () => {
    expect(materialChanges(grey, edit({ name: 'Grey PLA', shrinkagePercent: 0.3 }))).toEqual({
      name: 'Grey PLA',
      shrinkagePercent: 0.3,
    });
  });
});
