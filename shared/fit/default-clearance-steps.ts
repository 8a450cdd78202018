import type { FitClass, Material, Process } from '../schemas/joint-options';
import { clearanceDefaults } from './clearance-defaults';
import { formatMm } from './format-mm';
import { formatRange } from './format-range';
import { materialStep, type MaterialTuningInput } from './material-step';

/** One step of a clearance derivation: what it is, how many mm per side it adds, where it comes from. */
export interface ClearanceStep {
  readonly label: string;
  /** mm per side; negative steps take clearance away. */
  readonly mm: number;
  readonly source: string;
}

/** A derivation step with its words for the plain-text derivation. */
export interface WordedStep {
  readonly step: ClearanceStep;
  readonly words: string;
}

/**
 * The steps from the defaults to a clearance, without the final floor at 0 mm: the published default for
 * the process and fit class, the material adjustment (a team material's when `materialTuning` is given, named
 * even at 0; the built-in material's when it is not 0), the calibration offset when given.
 *
 * @param input - process (already defaulted), material, fit, optional team material tuning (mm per side),
 *   optional calibration offset (mm per side) and source
 * @returns the steps in order, each with its words; their `mm` add up to the clearance
 * @throws RangeError for an unknown process, fit or material, or an adjustment or offset that is not finite
 * @example
 * defaultClearanceSteps({ process: 'fdm', material: 'PLA', fit: 'slide' });
 * // [{ step: { label: 'slide fit default on FDM', mm: 0.25, source: … }, words: '0.25 mm from the published 0.2–0.3 mm range' }]
 */
export function defaultClearanceSteps(input: {
  readonly process: Process;
  readonly material: Material;
  readonly fit: FitClass;
  readonly materialTuning?: MaterialTuningInput;
  readonly calibrationOffset?: number;
  readonly calibrationSource?: string;
}): WordedStep[] {
  const base = clearanceDefaults[input.process]?.[input.fit];
  // The types already rule this out; the check is for callers that skipped the schema.
  if (!base) throw new RangeError(`no default clearance for a ${input.fit} fit on ${input.process}`);
  const material = materialStep(input.material, input.materialTuning);

  const range = formatRange(base.range);
  const steps: WordedStep[] = [
    {
      step: {
        label: `${input.fit} fit default on ${input.process === 'fdm' ? 'FDM' : 'resin'}`,
        mm: base.mm,
        // Users see this: name the kind of source, not the project's internal reference list.
        source: `${base.source} (3D-printing design guides and service-bureau tables)`,
      },
      words: `${formatMm(base.mm)} from ${range}`,
    },
  ];
  if (material) steps.push(material);
  const offset = input.calibrationOffset;
  if (offset !== undefined) {
    if (!Number.isFinite(offset)) {
      throw new RangeError(`calibrationOffset must be a finite number of mm per side; got ${offset}`);
    }
    const label = input.calibrationSource ?? "your printer's calibration";
    steps.push({ step: { label, mm: offset, source: label }, words: `${label} ${formatMm(offset, true)}` });
  }
  return steps;
}
