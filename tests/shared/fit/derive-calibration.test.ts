import { describe, expect, it } from 'vitest';
import { deriveCalibration } from '../../../shared/fit/derive-calibration';
import type { FitTestOutcome } from '../../../shared/schemas/fit-test-answer';

// A coupon graded 0.00–0.40 mm in 0.05 mm steps, marks 1–9; `outcomes` lists what each pocket did.
const answers = (outcomes: FitTestOutcome[], from = 0, step = 0.05) =>
  outcomes.map((outcome, i) => ({
    mark: String(i + 1),
    clearancePerSide: Math.round((from + i * step) * 1e4) / 1e4,
    outcome,
  }));

describe('deriveCalibration', () => {
  it.each([
    {
      name: 'a clean progression',
      outcomes: [
        'no-entry',
        'no-entry',
        'forced',
        'forced',
        'snug',
        'snug',
        'free',
        'free',
        'wobbly',
      ] as FitTestOutcome[],
      best: { press: 0.1, snug: 0.2, slide: 0.3 },
      notes: 0,
    },
    {
      name: 'no snug pocket between forced and free',
      outcomes: [
        'no-entry',
        'forced',
        'forced',
        'free',
        'free',
        'wobbly',
        'wobbly',
        'wobbly',
        'wobbly',
      ] as FitTestOutcome[],
      best: { press: 0.05, slide: 0.15 },
      notes: 1,
    },
    {
      name: 'everything too loose',
      outcomes: [
        'free',
        'free',
        'wobbly',
        'wobbly',
        'wobbly',
        'wobbly',
        'wobbly',
        'wobbly',
        'wobbly',
      ] as FitTestOutcome[],
      best: { slide: 0 },
      notes: 2,
    },
  ])('finds the tightest pocket per fit class for $name', ({ outcomes, best, notes }) => {
    const reading = deriveCalibration(answers(outcomes));
    expect(reading.ok).toBe(true);
    if (!reading.ok) return;
    const found = Object.fromEntries(Object.entries(reading.best).map(([fit, b]) => [fit, b.clearancePerSide]));
    expect(found).toEqual(best);
    expect(reading.notes).toHaveLength(notes);
  });

  it('names the range to test next when a fit class falls between two pockets', () => {
    const reading = deriveCalibration(answers(['forced', 'free', 'wobbly'], 0.1, 0.1));
    expect(reading.ok && reading.notes[0]).toBe(
      'no pocket gave a snug fit: it lies between 0.10 mm (went in only with force) and 0.20 mm (slid freely); test that range in finer steps',
    );
  });

  it('refuses contradictory answers with both marks instead of guessing', () => {
    // Pocket 3 (0.10 mm) slid freely while the looser pocket 4 (0.15 mm) needed force.
    const reading = deriveCalibration(answers(['no-entry', 'forced', 'free', 'forced', 'snug']));
    expect(reading.ok).toBe(false);
    if (reading.ok) return;
    expect(reading.problems).toHaveLength(1);
    expect(reading.problems[0]).toMatch(
      /^pocket 3 \(0\.10 mm\) slid freely but the looser pocket 4 \(0\.15 mm\) went in only with force/,
    );
  });

  it('reads answers in any order', () => {
    const shuffled = answers(['no-entry', 'forced', 'snug', 'free']).reverse();
    const reading = deriveCalibration(shuffled);
    expect(reading.ok && reading.best.snug).toEqual({ clearancePerSide: 0.1, mark: '3' });
  });
});
