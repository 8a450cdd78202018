import type { Material } from '../schemas/joint-options';

/** A default linear shrinkage, in percent, with where it comes from. */
export interface ShrinkageDefault {
  /** Linear shrinkage in percent (0.5 means the part comes out 0.5 % small). */
  readonly percent: number;
  /** Why this number, in words; always says it is editable. */
  readonly source: string;
}

const EDIT = 'sources disagree widely, so measure a test print and edit it';

/**
 * Default linear shrinkage per material. Common practice only: the published figures (REFERENCES §7.1) are
 * from weak pages and differ by an order of magnitude, so each value is a starting point the user edits.
 */
export const shrinkageDefaults: Readonly<Record<Material, ShrinkageDefault>> = {
  // REFERENCES §7.1 sees 0.1–0.2 % and "about 0.2 %" on weak pages; 0.2 is where they meet.
  PLA: { percent: 0.2, source: `common practice: about 0.2 % for PLA; ${EDIT}` },
  // REFERENCES §7.1 sees 0.2–0.4 % and 0.6 %; 0.4 is in the middle of the spread.
  PETG: { percent: 0.4, source: `common practice: about 0.4 % for PETG; ${EDIT}` },
  // REFERENCES §7.1 sees 1.0–1.5 % for ABS and ASA; 1.0 is the low end (the smallest change that helps).
  ABS: { percent: 1.0, source: `common practice: about 1 % for ABS; ${EDIT}` },
  ASA: { percent: 1.0, source: `common practice: about 1 % for ASA; ${EDIT}` },
  // REFERENCES §7.1 sees "up to 2.0 %" for nylon; 1.5 stays below that ceiling.
  PA: { percent: 1.5, source: `common practice: about 1.5 % for nylon (PA); ${EDIT}` },
  // No figure found for TPU (REFERENCES §7.1): no compensation until a test print says otherwise.
  TPU: { percent: 0, source: `common practice: no compensation for TPU (no figure found); ${EDIT}` },
  // No resin figures in REFERENCES §7.1; resin slicers usually compensate, so none here by default.
  'resin-standard': { percent: 0, source: `common practice: no compensation for resin; ${EDIT}` },
  'resin-tough': { percent: 0, source: `common practice: no compensation for resin; ${EDIT}` },
};
