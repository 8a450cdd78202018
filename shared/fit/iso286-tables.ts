// ISO 286 limits and fits as data: hole-basis clearance fits (H holes, shafts c to h), grades IT6 to IT11,
// sizes over 3 mm up to and including 50 mm. Values in µm exactly as the standard's tables print them.
// The IT formula (i = 0.45·∛D + 0.001·D) is deliberately not used: the printed tables carry ISO's rounding
// rules, e.g. IT6 for 3–6 mm is 8 µm where the formula gives 7.33 µm (REFERENCES §1.1).

/** Tolerance grades held here: IT6 to IT11. */
export const isoGrades = [6, 7, 8, 9, 10, 11] as const;
/** One of the tolerance grades held here (IT6 to IT11). */
export type IsoGrade = (typeof isoGrades)[number];

/** Shaft letters held here: c to h, the clearance-fit shafts (their upper deviation es is 0 or below). */
export const shaftLetters = ['c', 'd', 'e', 'f', 'g', 'h'] as const;
/** One of the shaft letters held here (c to h). */
export type ShaftLetter = (typeof shaftLetters)[number];

/** One size range of an ISO 286 table: over `over` mm, up to and including `upTo` mm. */
export interface SizeRow {
  readonly over: number;
  readonly upTo: number;
  readonly values: readonly number[];
}

/**
 * Standard tolerances in µm. `values` are IT6, IT7, IT8, IT9, IT10, IT11 in that order.
 * Source: ISO 286-1 Table 1 via REFERENCES §1.1 [published]; three independent reprints agree on every cell.
 */
export const standardToleranceRows: readonly SizeRow[] = [
  { over: 3, upTo: 6, values: [8, 12, 18, 30, 48, 75] },
  { over: 6, upTo: 10, values: [9, 15, 22, 36, 58, 90] },
  { over: 10, upTo: 18, values: [11, 18, 27, 43, 70, 110] },
  { over: 18, upTo: 30, values: [13, 21, 33, 52, 84, 130] },
  { over: 30, upTo: 50, values: [16, 25, 39, 62, 100, 160] },
];

/**
 * Shaft fundamental (upper) deviations es in µm. `values` are c, d, e, f, g, h in that order.
 * Source: ISO 286-2 via REFERENCES §1.2 [published]; two reprints carry the full rows, a third confirms
 * them up to 14 mm. The c row is the one that splits 30–50 mm into 30–40 and 40–50.
 */
export const shaftDeviationRows: readonly SizeRow[] = [
  { over: 3, upTo: 6, values: [-70, -30, -20, -10, -4, 0] },
  { over: 6, upTo: 10, values: [-80, -40, -25, -13, -5, 0] },
  { over: 10, upTo: 18, values: [-95, -50, -32, -16, -6, 0] },
  { over: 18, upTo: 30, values: [-110, -65, -40, -20, -7, 0] },
  { over: 30, upTo: 40, values: [-120, -80, -50, -25, -9, 0] },
  { over: 40, upTo: 50, values: [-130, -80, -50, -25, -9, 0] },
];

/**
 * Names of the preferred hole-basis clearance fits, keyed "H7/g6".
 * Source: ISO 286-1:2010 preferred fits, as summarised in REFERENCES §1.3 [published].
 */
export const preferredFitNames: Readonly<Record<string, string>> = {
  'H11/c11': 'loose running',
  'H9/d9': 'free running',
  'H8/f7': 'close running',
  'H7/g6': 'sliding',
  'H7/h6': 'locational clearance',
};
