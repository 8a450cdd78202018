import { z } from 'zod';
import { materialMatchesProcess } from '../../../../shared/fit/material-matches-process';
import { fitTestOutcomeSchema, type FitTestOutcome } from '../../../../shared/schemas/fit-test-answer';
import { materialSchema } from '../../../../shared/schemas/joint-options';
import type { CouponForm } from './coupon-form';

/** Answers not saved yet, by pocket (see the panel's answer keys). */
export type DraftAnswers = Record<string, FitTestOutcome>;

/** A fit test in progress: the coupon settings and the answers entered so far. */
export interface FitTestDraft {
  coupon: CouponForm;
  answers: DraftAnswers;
}

/** The part of the Web Storage API the draft uses (sessionStorage in the browser, a fake in tests). */
export type DraftStorage = Pick<Storage, 'getItem' | 'setItem' | 'removeItem'>;

/** The storage key of one printer profile's draft. */
export const fitTestDraftKey = (profileId: string) => `seamwright.fit-test-draft.${profileId}`;

// Every field falls back to its default on its own: a half-typed width must not cost the answers.
function draftSchema(d: CouponForm) {
  const n = (fallback: number) => z.number().catch(fallback);
  return z.object({
    coupon: z
      .object({
        joint: z.enum(['key', 'dovetail']).catch(d.joint),
        material: materialSchema.refine((m) => materialMatchesProcess(m, d.process)).catch(d.material),
        key: z
          .object({
            shape: z.enum(['square', 'round', 'hex']).catch(d.key.shape),
            width: n(d.key.width),
            depth: n(d.key.depth),
          })
          .catch(d.key),
        dovetail: z
          .object({ rootWidth: n(d.dovetail.rootWidth), height: n(d.dovetail.height), slope: n(d.dovetail.slope) })
          .catch(d.dovetail),
        clearanceFrom: n(d.clearanceFrom),
        clearanceTo: n(d.clearanceTo),
        clearanceStep: n(d.clearanceStep),
      })
      // The printer's process is not the draft's to change.
      .transform((c): CouponForm => ({ ...c, process: d.process }))
      .catch(d),
    answers: z.record(z.string(), fitTestOutcomeSchema).catch({}),
  });
}

/**
 * The draft kept for a printer profile, its fields checked one by one against `defaults`.
 *
 * @param storage - sessionStorage (or a fake)
 * @param profileId - the printer profile's id
 * @param defaults - the settings of a new fit test on this printer; they replace any field that does not fit
 * @returns the draft, or null when there is none or it cannot be read
 */
export function readFitTestDraft(storage: DraftStorage, profileId: string, defaults: CouponForm): FitTestDraft | null {
  try {
    const text = storage.getItem(fitTestDraftKey(profileId));
    if (!text) return null;
    const parsed = draftSchema(defaults).safeParse(JSON.parse(text));
    return parsed.success ? parsed.data : null;
  } catch {
    return null;
  }
}

/** Keeps the draft of a printer profile; a full or refused storage only costs the draft. */
export function writeFitTestDraft(storage: DraftStorage, profileId: string, draft: FitTestDraft): void {
  try {
    storage.setItem(fitTestDraftKey(profileId), JSON.stringify(draft));
  } catch {
    // The draft is a convenience: the panel works without it.
  }
}

/** Forgets the draft of a printer profile (once its answers are saved). */
export function clearFitTestDraft(storage: DraftStorage, profileId: string): void {
  try {
    storage.removeItem(fitTestDraftKey(profileId));
  } catch {
    // Nothing to forget where nothing could be kept.
  }
}
