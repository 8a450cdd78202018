import type { FitTestAnswer, FitTestOutcome } from '../../../../shared/schemas/fit-test-answer';

/** A 0.00–0.35 mm coupon in 0.05 mm steps: 8 pockets marked 1–8. */
export const range = { clearanceFrom: 0, clearanceTo: 0.35, clearanceStep: 0.05 } as const;

/** Answers for pockets 1, 2, … of `range`, one outcome each, tightest first. */
export function answersOf(...outcomes: FitTestOutcome[]): FitTestAnswer[] {
  return outcomes.map((outcome, i) => ({ mark: String(i + 1), clearancePerSide: Math.round(i * 50) / 1000, outcome }));
}

/** A clean PLA coupon: press at 0.05, snug at 0.15, slide at 0.25 mm per side. */
export const cleanAnswers = answersOf('no-entry', 'forced', 'forced', 'snug', 'snug', 'free', 'free', 'wobbly');

/** A PLA fit-test body for `range`. */
export const fitTestBody = (answers: FitTestAnswer[], material = 'PLA') => ({
  material,
  joint: 'key',
  coupon: range,
  answers,
});
