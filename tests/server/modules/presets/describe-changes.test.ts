import { describe, expect, it } from 'vitest';
import { describeChanges, type PresetSnapshot } from '../../../../server/modules/presets/describe-changes';

const before: PresetSnapshot = {
  name: 'Helmet seam',
  description: '',
  tags: ['helmet', 'pla'],
  printerProfileName: null,
  settings: { joint: 'key', material: 'PLA', fit: 'snug', key: { shape: 'square', width: 10, count: 6, flat: 0 } },
};

describe('describeChanges', () => {
  it('says nothing when nothing changed', () => {
    expect(describeChanges(before, structuredClone(before))).toEqual([]);
  });

  it('names each change in plain words with units', () => {
    const after: PresetSnapshot = {
      ...before,
      name: 'Helmet crown seam',
      description: 'Glued',
      tags: ['helmet', 'glued'],
      printerProfileName: 'Bench FDM',
      settings: { ...before.settings, fit: 'press', clearance: 0.12, key: { shape: 'square', width: 12, flat: 0 } },
    };
    expect(describeChanges(before, after)).toEqual([
      'name "Helmet seam" → "Helmet crown seam"',
      'description changed',
      'tags added: glued',
      'tags removed: pla',
      'printer profile none → "Bench FDM"',
      'fit snug → press',
      'key width 10 mm → 12 mm',
      'key count 6 → not set',
      'clearance per side not set → 0.12 mm',
    ]);
  });

  it('leaves out the old joint’s options when the joint changes', () => {
    const after = {
      ...before,
      settings: { joint: 'dovetail', material: 'PLA', fit: 'snug', dovetail: { rootWidth: 12, endStop: true } },
    };
    expect(describeChanges(before, after)).toEqual([
      'joint key → dovetail',
      'dovetail root width not set → 12 mm',
      'dovetail end stop not set → on',
    ]);
  });
});
