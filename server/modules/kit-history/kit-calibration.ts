import { AppError } from '../../errors/app-error';
import type { ResolvedKitRequest } from '../../../shared/schemas/kit-request';
import type { PrinterProfile } from '../../../shared/schemas/printer-profile';
import { profileCalibration } from '../../../shared/library/profile-calibration';

/** The request the kit is built from, and the calibration it used (null: none). */
export interface CalibratedRequest {
  request: ResolvedKitRequest;
  calibration: { offsetMm: number; source: string } | null;
}

// The words resolveClearance uses when it is not told whose calibration it applies.
const GENERIC_CALIBRATION = "your printer's calibration";

/**
 * Applies the printer profile's calibration to a kit request: the entry for the request's material and fit
 * class sets `calibrationOffset`. Without a profile the request keeps its own offset (if any). A profile of
 * the other process is refused: its calibration would not apply. A profile with no entry for this material
 * and fit leaves the request as it is.
 *
 * @throws AppError VALIDATION_FAILED when the profile prints another process than the request
 */
export function applyCalibration(request: ResolvedKitRequest, profile: PrinterProfile | null): CalibratedRequest {
  if (!profile) {
    const own = request.calibrationOffset;
    return {
      request,
      calibration: own === undefined ? null : { offsetMm: own, source: 'the offset given with the request' },
    };
  }
  if (profile.process !== request.process) {
    const words = (p: string) => (p === 'fdm' ? 'FDM' : 'resin');
    throw new AppError(
      'VALIDATION_FAILED',
      `Printer profile "${profile.name}" is a ${words(profile.process)} printer, but this kit is for ${words(request.process)}.`,
      [{ path: 'printerProfileId', message: `Choose a ${words(request.process)} printer profile, or none.` }],
    );
  }
  const calibration = profileCalibration(profile, request.material, request.fit);
  if (!calibration) return applyCalibration(request, null);
  return {
    // The source travels with the request, so the fit derivation in the manifest names the profile.
    request: { ...request, calibrationOffset: calibration.offsetMm, calibrationSource: calibration.source },
    calibration,
  };
}

/**
 * The manifest's derivation with the calibration named: the kit request carries no source for its offset
 * yet, so the engine writes "your printer's calibration"; the history says whose it was.
 */
export function namedDerivation(derivation: string, calibration: CalibratedRequest['calibration']): string {
  return calibration ? derivation.replace(GENERIC_CALIBRATION, calibration.source) : derivation;
}
