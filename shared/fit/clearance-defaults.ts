import type { FitClass, Process } from '../schemas/joint-options';

/** A default clearance per side and the published range it was chosen from. */
export interface ClearanceDefault {
  /** Default clearance per side in mm, a point inside `range`. */
  readonly mm: number;
  /** The range in mm per side; a missing end is open ("below 0.15 mm", "above 0.3 mm"). */
  readonly range: { readonly min?: number; readonly max?: number };
  /** Where the range comes from, in words for the derivation. */
  readonly source: string;
}

/**
 * Default clearance per side for each process and fit class, in mm. Every range is from REFERENCES §7.2
 * (printing clearances, gap per side); the point inside it is Seamwright's choice, explained beside it.
 * `snug` (aligns exactly, glued) has no published range of its own: it sits between press and slide.
 */
export const clearanceDefaults: Readonly<Record<Process, Readonly<Record<FitClass, ClearanceDefault>>>> = {
  fdm: {
    // REFERENCES §7.2 "Press / tight", 0.1–0.15 mm per side [published, two sources]; the "Press (alternative)"
    // row gives 0.05–0.1 [published]. 0.1 lies in both: the tight end, as a press fit has no glue to fill a gap.
    press: { mm: 0.1, range: { min: 0.1, max: 0.15 }, source: 'the published FDM press-fit range' },
    // Between the published press (0.1–0.15) and sliding (0.2–0.3) ranges of REFERENCES §7.2, so the span is
    // 0.1–0.3 mm. 0.16 is just above press (goes in by hand, leaves a glue film) and below sliding (no play).
    snug: { mm: 0.16, range: { min: 0.1, max: 0.3 }, source: 'the published FDM press-to-sliding span' },
    // REFERENCES §7.2 "Sliding", 0.2–0.3 mm per side [published, three sources]. 0.25 is the middle.
    slide: { mm: 0.25, range: { min: 0.2, max: 0.3 }, source: 'the published FDM sliding-fit range' },
  },
  resin: {
    // REFERENCES §7.2 "SLA loose / tight": tight below 0.15 mm [published]. 0.1 keeps a margin from the edge
    // because the same source gives resin parts a ±0.15 mm tolerance.
    press: { mm: 0.1, range: { max: 0.15 }, source: 'the published resin tight-fit range' },
    // Between the published resin tight (< 0.15) and loose (> 0.3) ranges of REFERENCES §7.2. 0.2 sits below
    // the 0.25 mm resin default a service bureau publishes there for two fitting parts.
    snug: { mm: 0.2, range: { min: 0.15, max: 0.3 }, source: 'the published resin tight-to-loose span' },
    // REFERENCES §7.2 "SLA loose / tight": loose above 0.3 mm [published]. 0.35 is inside, under the 0.5 mm
    // above which Seamwright warns.
    slide: { mm: 0.35, range: { min: 0.3 }, source: 'the published resin loose-fit range' },
  },
};
