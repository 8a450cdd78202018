import { describe, expect, it } from 'vitest';
import { couponFormDefaults } from '../../../../../src/features/printer-profiles/lib/coupon-form';
import {
  clearFitTestDraft,
  fitTestDraftKey,
  readFitTestDraft,
  writeFitTestDraft,
  type DraftStorage,
} from '../../../../../src/features/printer-profiles/lib/fit-test-draft';

const fakeStorage = () => {
  const items = new Map<string, string>();
  const storage: DraftStorage = {
    getItem: (k) => items.get(k) ?? null,
    setItem: (k, v) => void items.set(k, v),
    removeItem: (k) => void items.delete(k),
  };
  return { storage, items };
};
const defaults = couponFormDefaults('fdm', 'PLA');
const answers = { 'key:1@0': 'forced', 'key:2@0.05': 'snug' } as const;

describe('readFitTestDraft', () => {
  it('gives back what was written for the same profile when nothing changed', () => {
    const { storage } = fakeStorage();
    const draft = { coupon: { ...defaults, joint: 'dovetail' as const, material: 'PETG' as const }, answers };
    writeFitTestDraft(storage, 'p1', draft);
    expect(readFitTestDraft(storage, 'p1', defaults)).toEqual(draft);
    expect(readFitTestDraft(storage, 'p2', defaults)).toBeNull();
  });

  it('replaces only the fields that do not fit when the draft is partly broken', () => {
    const { storage, items } = fakeStorage();
    // A half-typed width is NaN in the form and null in JSON; a resin material does not fit an FDM printer.
    items.set(
      fitTestDraftKey('p1'),
      JSON.stringify({
        coupon: {
          ...defaults,
          key: { ...defaults.key, width: Number.NaN },
          material: 'resin-standard',
          process: 'resin',
        },
        answers,
      }),
    );
    const draft = readFitTestDraft(storage, 'p1', defaults)!;
    expect(draft.coupon).toEqual(defaults);
    expect(draft.answers).toEqual(answers);
  });

  it('reads no draft when the stored text is not JSON or the storage refuses', () => {
    const { storage, items } = fakeStorage();
    items.set(fitTestDraftKey('p1'), '{not json');
    expect(readFitTestDraft(storage, 'p1', defaults)).toBeNull();
    const refusing: DraftStorage = {
      getItem: () => {
        throw new Error('denied');
      },
      setItem: () => {
        throw new Error('full');
      },
      removeItem: () => {
        throw new Error('denied');
      },
    };
    expect(readFitTestDraft(refusing, 'p1', defaults)).toBeNull();
    expect(() => writeFitTestDraft(refusing, 'p1', { coupon: defaults, answers: {} })).not.toThrow();
    expect(() => clearFitTestDraft(refusing, 'p1')).not.toThrow();
  });

  it('drops unknown outcomes with the answers when one is not an outcome', () => {
    const { storage, items } = fakeStorage();
    items.set(fitTestDraftKey('p1'), JSON.stringify({ coupon: defaults, answers: { 'key:1@0': 'loose' } }));
    expect(readFitTestDraft(storage, 'p1', defaults)!.answers).toEqual({});
  });
});

describe('clearFitTestDraft', () => {
  it('forgets the draft of that profile only', () => {
    const { storage } = fakeStorage();
    writeFitTestDraft(storage, 'p1', { coupon: defaults, answers });
    writeFitTestDraft(storage, 'p2', { coupon: defaults, answers });
    clearFitTestDraft(storage, 'p1');
    expect(readFitTestDraft(storage, 'p1', defaults)).toBeNull();
    expect(readFitTestDraft(storage, 'p2', defaults)).not.toBeNull();
  });
});
