import type { FitClass } from '../schemas/joint-options';
import type { FitTestAnswer, FitTestOutcome } from '../schemas/fit-test-answer';

/** Tightness rank of each outcome: a looser pocket may never rank tighter than a tighter one. */
const rank: Record<FitTestOutcome, number> = { 'no-entry': 0, forced: 1, snug: 2, free: 3, wobbly: 4 };
/** Which outcome each fit class is looking for. */
const wanted: Record<FitClass, FitTestOutcome> = { press: 'forced', snug: 'snug', slide: 'free' };
const words: Record<FitTestOutcome, string> = {
  'no-entry': 'did not go in',
  forced: 'went in only with force',
  snug: 'was snug',
  free: 'slid freely',
  wobbly: 'wobbled',
};
const mm = (v: number) => `${v.toFixed(2)} mm`;

/** The result of reading a coupon: the best clearance per fit class found, or why none can be trusted. */
export type CalibrationReading =
  | { ok: true; best: Partial<Record<FitClass, { clearancePerSide: number; mark: string }>>; notes: string[] }
  | { ok: false; problems: string[] };

/**
 * Reads a printed coupon's answers: for each fit class, the tightest pocket that gave the wanted outcome
 * (press: went in with force; snug: snug; slide: slid freely). Answers must get looser as the clearance
 * grows; a tighter pocket that fitted looser than a looser one is a contradiction, reported with both marks
 * rather than guessed around. A class with no matching pocket gets a note saying which range to test next.
 *
 * @param answers - one per pocket, any order; at least one
 * @returns the best clearance per class with notes, or the contradictions
 * @example
 * deriveCalibration([{ mark: '1', clearancePerSide: 0.1, outcome: 'forced' }, { mark: '2', clearancePerSide: 0.15, outcome: 'snug' }]);
 * // { ok: true, best: { press: { clearancePerSide: 0.1, mark: '1' }, snug: { clearancePerSide: 0.15, mark: '2' } }, notes: [...] }
 */
export function deriveCalibration(answers: readonly FitTestAnswer[]): CalibrationReading {
  const sorted = [...answers].sort((a, b) => a.clearancePerSide - b.clearancePerSide);
  const problems = contradictions(sorted);
  if (problems.length > 0) return { ok: false, problems };
  const best: Partial<Record<FitClass, { clearancePerSide: number; mark: string }>> = {};
  const notes: string[] = [];
  for (const fit of ['press', 'snug', 'slide'] as const) {
    const hit = sorted.find((a) => a.outcome === wanted[fit]);
    if (hit) best[fit] = { clearancePerSide: hit.clearancePerSide, mark: hit.mark };
    else notes.push(missingNote(fit, sorted));
  }
  return { ok: true, best, notes };
}

function contradictions(sorted: readonly FitTestAnswer[]): string[] {
  const problems: string[] = [];
  for (let i = 0; i + 1 < sorted.length; i++) {
    const [tight, loose] = [sorted[i]!, sorted[i + 1]!];
    if (rank[loose.outcome] < rank[tight.outcome]) {
      problems.push(
        `pocket ${tight.mark} (${mm(tight.clearancePerSide)}) ${words[tight.outcome]} but the looser pocket ${loose.mark} (${mm(loose.clearancePerSide)}) ${words[loose.outcome]}: check that the marks were read right, clean any stringing out of the pockets, or print the coupon again`,
      );
    }
  }
  return problems;
}

function missingNote(fit: FitClass, sorted: readonly FitTestAnswer[]): string {
  const target = rank[wanted[fit]];
  const below = [...sorted].reverse().find((a) => rank[a.outcome] < target);
  const above = sorted.find((a) => rank[a.outcome] > target);
  if (below && above) {
    return `no pocket gave a ${fit} fit: it lies between ${mm(below.clearancePerSide)} (${words[below.outcome]}) and ${mm(above.clearancePerSide)} (${words[above.outcome]}); test that range in finer steps`;
  }
  if (above)
    return `no pocket gave a ${fit} fit: even the tightest (${mm(above.clearancePerSide)}) ${words[above.outcome]}; test smaller clearances`;
  return `no pocket gave a ${fit} fit: even the loosest (${mm(below!.clearancePerSide)}) ${words[below!.outcome]}; test larger clearances`;
}
