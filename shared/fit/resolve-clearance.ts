import type { FitClass, Material, Process } from '../schemas/joint-options';
import { clearanceWarnings } from './clearance-warnings';
import { defaultClearanceSteps, type ClearanceStep } from './default-clearance-steps';
import { defaultProcessFor } from './default-process-for';
import { describeFit } from './describe-fit';
import { explicitClearance } from './explicit-clearance';
import { formatMm } from './format-mm';
import { materialMatchesProcess } from './material-matches-process';
import type { MaterialTuningInput } from './material-step';
import { roundTo } from './round-to';

/** What the fit engine needs to choose a clearance. Lengths in mm per side. */
export interface ClearanceInput {
  /** Print process; default `'resin'` for `resin-…` materials, else `'fdm'`. */
  readonly process?: Process;
  readonly material: Material;
  readonly fit: FitClass;
  /**
   * A team material chosen for the joint, a variant of `material`: its clearance adjustment (mm per side, may
   * be negative) replaces the built-in material's, and its name appears in the derivation. Default none.
   */
  readonly materialTuning?: MaterialTuningInput;
  /** mm per side from a printer profile's fit test; may be negative. Default none. */
  readonly calibrationOffset?: number;
  /** Where the offset comes from, for the derivation; default "your printer's calibration". */
  readonly calibrationSource?: string;
  /** Explicit clearance per side in mm (0 or more); overrides everything else. */
  readonly clearance?: number;
}

/** The chosen clearance, how it was reached, and what to watch out for. */
export interface ClearanceResult {
  /** Clearance per side in mm, rounded to 0.001 mm, never negative. */
  readonly clearancePerSide: number;
  /** The derivation in plain words, result first. */
  readonly derivation: string;
  /** The same derivation as data; the `mm` values add up to `clearancePerSide` (before rounding). */
  readonly steps: ClearanceStep[];
  /** Plain-words warnings with the numbers; empty when nothing is wrong. */
  readonly warnings: string[];
}

/**
 * Chooses the clearance per side for a joint: the published default for the process and fit class, plus a
 * per-material adjustment (the team material's when `materialTuning` is given, else the built-in material's),
 * plus the printer's calibration offset, floored at 0 mm. An explicit clearance replaces all of that.
 *
 * @param input - see {@link ClearanceInput}; only `material` and `fit` are required
 * @returns the clearance per side in mm (0.001 mm steps), its derivation in words and as steps, and warnings
 *   (below 0.05 mm on FDM, above 0.5 mm, no gap at all, a material that does not match the process)
 * @throws RangeError for a non-finite offset or tuning adjustment, or an explicit clearance that is negative or
 *   not finite
 * @example
 * resolveClearance({ material: 'PETG', fit: 'snug', calibrationOffset: -0.03,
 *   calibrationSource: "your printer's fit test" }).derivation;
 * // "0.15 mm: snug fit in PETG on FDM, 0.16 mm from the published 0.1–0.3 mm range, +0.02 mm for PETG,
 * //  your printer's fit test −0.03 mm"
 * resolveClearance({ material: 'PLA', fit: 'snug',
 *   materialTuning: { name: 'Grey matte PLA', clearanceAdjustment: 0.03 } }).derivation;
 * // "0.19 mm: snug fit in PLA on FDM, 0.16 mm from the published 0.1–0.3 mm range,
 * //  +0.03 mm for Grey matte PLA (a team material based on PLA)"
 */
export function resolveClearance(input: ClearanceInput): ClearanceResult {
  const process = input.process ?? defaultProcessFor(input.material);
  const fitWords = describeFit(input.fit, input.material, process);
  const mismatch = materialMatchesProcess(input.material, process)
    ? []
    : [`${input.material} is not printed on ${process === 'fdm' ? 'FDM' : 'a resin printer'}: check the material`];

  if (input.clearance !== undefined) {
    const explicit = explicitClearance(input.clearance, fitWords, process);
    return { ...explicit, warnings: [...mismatch, ...explicit.warnings] };
  }

  const parts = defaultClearanceSteps({ ...input, process });
  const sum = roundTo(
    parts.reduce((total, part) => total + part.step.mm, 0),
    3,
  );
  // A large negative calibration can push the sum below zero; a negative gap cannot be modelled, so the
  // result stops at 0 and the raise is recorded as a step, keeping the steps' sum equal to the result.
  if (sum < 0) {
    parts.push({
      step: { label: 'raised to 0 mm', mm: -sum, source: 'a clearance cannot be negative' },
      words: 'raised to 0 mm',
    });
  }
  const clearancePerSide = Math.max(0, sum);
  return {
    clearancePerSide,
    derivation: `${formatMm(clearancePerSide)}: ${fitWords}, ${parts.map((part) => part.words).join(', ')}`,
    steps: parts.map((part) => part.step),
    warnings: [...mismatch, ...clearanceWarnings(clearancePerSide, process)],
  };
}
