import { holeLimits } from './hole-limits';
import { preferredFitNames } from './iso286-tables';
import { parseIsoFit } from './parse-iso-fit';
import { shaftLimits } from './shaft-limits';
import type { ToleranceLimits } from './tolerance-limits';

/** The limits and clearance range of an ISO 286 hole-basis fit. */
export interface IsoFitClearance {
  /** Nominal size in mm. */
  readonly size: number;
  /** Hole limits in µm (H hole: lower 0, upper +IT). */
  readonly hole: ToleranceLimits;
  /** Shaft limits in µm (0 or negative for c to h). */
  readonly shaft: ToleranceLimits;
  /** Smallest clearance in µm, on the diameter: hole lower − shaft upper. */
  readonly minClearanceUm: number;
  /** Largest clearance in µm, on the diameter: hole upper − shaft lower. */
  readonly maxClearanceUm: number;
  /** Preferred-fit name ("sliding", "close running", …), or "clearance" for a fit outside the preferred list. */
  readonly name: string;
  /** Whether the fit is one of ISO 286's preferred fits. */
  readonly preferred: boolean;
}

/**
 * Limits and clearance of an ISO 286 hole-basis fit given as text. Clearances are on the diameter (the
 * difference of the two sizes), as the standard gives them, not per side.
 *
 * @param text - the fit, e.g. "10 H7/g6" (see {@link parseIsoFit} for the accepted forms)
 * @returns sizes and limits in µm, the clearance range in µm and the fit's name
 * @throws SyntaxError or RangeError from {@link parseIsoFit} for text that is not a fit held here
 * @example
 * isoFitClearance('10 H7/g6');
 * // { size: 10, hole: { upper: 15, lower: 0 }, shaft: { upper: -5, lower: -14 },
 * //   minClearanceUm: 5, maxClearanceUm: 29, name: 'sliding', preferred: true }
 */
export function isoFitClearance(text: string): IsoFitClearance {
  const fit = parseIsoFit(text);
  const hole = holeLimits(fit.holeGrade, fit.size);
  const shaft = shaftLimits(fit.shaftLetter, fit.shaftGrade, fit.size);
  const name = preferredFitNames[`H${fit.holeGrade}/${fit.shaftLetter}${fit.shaftGrade}`];
  return {
    size: fit.size,
    hole,
    shaft,
    minClearanceUm: hole.lower - shaft.upper,
    maxClearanceUm: hole.upper - shaft.lower,
    name: name ?? 'clearance',
    preferred: name !== undefined,
  };
}
