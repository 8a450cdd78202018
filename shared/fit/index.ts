// The fit engine: clearances for printed joints (published ranges, material, calibration), key scales,
// shrinkage compensation, and ISO 286 limits and fits for metal hardware. Pure functions over plain data.

export { resolveClearance, type ClearanceInput, type ClearanceResult } from './resolve-clearance';
export type { ClearanceStep } from './default-clearance-steps';
export type { MaterialTuningInput } from './material-step';
export { defaultProcessFor } from './default-process-for';
export { materialMatchesProcess } from './material-matches-process';
export { keyScaleForClearance } from './key-scale-for-clearance';
export { clearanceForKeyScale } from './clearance-for-key-scale';
export { defaultShrinkage } from './default-shrinkage';
export { compensateForShrinkage } from './compensate-for-shrinkage';
export { clearanceDefaults, type ClearanceDefault } from './clearance-defaults';
export { materialAdjustments, type MaterialAdjustment } from './material-adjustments';
export { shrinkageDefaults, type ShrinkageDefault } from './shrinkage-defaults';
export { FDM_MIN_RELIABLE_CLEARANCE_MM, MAX_RELIABLE_CLEARANCE_MM } from './reliable-clearance';

export { standardTolerance } from './standard-tolerance';
export { shaftFundamentalDeviation } from './shaft-fundamental-deviation';
export { holeLimits } from './hole-limits';
export { shaftLimits } from './shaft-limits';
export type { ToleranceLimits } from './tolerance-limits';
export { parseIsoFit, type IsoFit } from './parse-iso-fit';
export { isoFitClearance, type IsoFitClearance } from './iso-fit-clearance';
export { dowelPocketDiameter, type DowelPocket } from './dowel-pocket-diameter';
export { isoFitSchema } from './iso-fit-schema';
export { isoGrades, shaftLetters, type IsoGrade, type ShaftLetter } from './iso286-tables';
export { deriveCalibration, type CalibrationReading } from './derive-calibration';
export { calibrationOffsets, MAX_CALIBRATION_OFFSET_MM, type CalibrationOffsets } from './calibration-offsets';
