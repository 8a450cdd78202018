import type { KitRequest } from '../../../../shared/schemas/kit-request';
import type { PresetSettings, PresetSettingsInput } from '../../../../shared/schemas/preset-settings';
import type { PrinterProfile } from '../../../../shared/schemas/printer-profile';
import { profileCalibration } from '../../../../shared/library/profile-calibration';
import { DEFAULT_DESIGN, toKitRequest, type DesignValues } from './design-values';

/**
 * The form's values with a preset's settings in place: joint, process, material, fit, clearance, the
 * correction or printer profile and every key or dovetail setting (settings the form has no field for are
 * kept and sent unchanged). The face stays as it is, since a preset has none; the other joint's settings stay
 * too, so switching joints still finds them.
 *
 * @param current - the form's values now
 * @param preset - the preset's settings and printer profile
 * @param profiles - the team's printer profiles: a preset's profile that is gone or prints another process is
 *   not chosen
 */
export function valuesFromPreset(
  current: DesignValues,
  preset: { settings: PresetSettings; printerProfileId: string | null },
  profiles: readonly Pick<PrinterProfile, 'id' | 'process'>[],
): DesignValues {
  const s = preset.settings;
  const profile = profiles.find((p) => p.id === preset.printerProfileId && p.process === s.process);
  return {
    ...current,
    joint: s.joint,
    process: s.process,
    material: s.material,
    fit: s.fit,
    clearanceMode: s.clearance === undefined ? 'derived' : 'set',
    clearance: s.clearance ?? current.clearance ?? DEFAULT_DESIGN.clearance,
    calibrationOffset: s.calibrationOffset,
    printerProfileId: profile?.id ?? '',
    format: s.format,
    chordTolerance: s.chordTolerance,
    key: s.joint === 'key' ? { ...s.key } : current.key,
    dovetail: s.joint === 'dovetail' ? { ...s.dovetail } : current.dovetail,
  };
}

/** A kit request's settings as a preset keeps them: everything but the face. */
export function settingsOf(request: KitRequest): PresetSettingsInput {
  const { face: _face, ...settings } = request;
  return settings as PresetSettingsInput;
}

/**
 * The form's values as text that changes exactly when what a preset would save changes (settings and printer
 * profile), so the screen can say whether the design still matches the preset it came from.
 */
export function presetText(values: DesignValues): string {
  return JSON.stringify({ settings: settingsOf(toKitRequest(values)), printerProfileId: values.printerProfileId });
}

/**
 * The kit request with the chosen printer profile's calibration for its material and fit applied, as the
 * server applies it when it builds the kit (shared/library/profile-calibration.ts): the preview then shows
 * the clearance the download will have. Without a profile, or with no entry, the request is unchanged.
 */
export function withProfileCalibration(
  request: KitRequest,
  profile: Pick<PrinterProfile, 'name' | 'calibration'> | null,
): KitRequest {
  if (!profile) return request;
  const calibration = profileCalibration(profile, request.material, request.fit);
  if (!calibration) return request;
  return { ...request, calibrationOffset: calibration.offsetMm, calibrationSource: calibration.source };
}
