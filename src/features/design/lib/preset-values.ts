import type { KitRequest } from '../../../../shared/schemas/kit-request';
import type { TeamMaterial } from '../../../../shared/schemas/material';
import { kitRequestSchema } from '../../../../shared/schemas/kit-request';
import type { Preset } from '../../../../shared/schemas/preset';
import { withoutFace, type PresetSettings, type PresetSettingsInput } from '../../../../shared/schemas/preset-settings';
import type { PrinterProfile } from '../../../../shared/schemas/printer-profile';
import { profileCalibration } from '../../../../shared/library/profile-calibration';
import { teamMaterialTuning } from '../../../../shared/library/team-material-tuning';
import { DEFAULT_DESIGN, toKitRequest, type DesignValues } from './design-values';
import type { StarterSetup } from './starter-setups';

/** The current team's printer profiles and materials, as far as the form needs them. */
export interface TeamChoices {
  readonly printerProfiles: readonly Pick<PrinterProfile, 'id' | 'name' | 'process' | 'calibration'>[];
  readonly teamMaterials: readonly Pick<TeamMaterial, 'id' | 'name' | 'baseMaterial' | 'clearanceAdjustments'>[];
}

const NO_TEAM: TeamChoices = { printerProfiles: [], teamMaterials: [] };

/** The chosen printer profile, if the team has it and it prints the chosen process. */
export function chosenProfile(values: DesignValues, team: TeamChoices | null) {
  return (
    (team ?? NO_TEAM).printerProfiles.find((p) => p.id === values.printerProfileId && p.process === values.process) ??
    null
  );
}

/** The chosen team material, if the team has it and it is based on the chosen material. */
export function chosenTeamMaterial(values: DesignValues, team: TeamChoices | null) {
  return (
    (team ?? NO_TEAM).teamMaterials.find((m) => m.id === values.teamMaterialId && m.baseMaterial === values.material) ??
    null
  );
}

/**
 * The form's values with a preset's settings in place: joint, process, material, fit, clearance, the
 * correction or printer profile, the team material and every key or dovetail setting (settings the form has
 * no field for are kept and sent unchanged). The face stays as it is, since a preset has none; the other
 * joint's settings stay too, so switching joints still finds them.
 *
 * @param current - the form's values now
 * @param preset - the preset's settings and printer profile
 * @param team - the team's printer profiles and materials: a preset's profile that is gone or prints another
 *   process is not chosen; a saved team-material tuning picks the team material of that name and base, or
 *   else is kept as saved
 */
export function valuesFromPreset(
  current: DesignValues,
  preset: { settings: PresetSettings; printerProfileId: string | null },
  team: TeamChoices | null,
): DesignValues {
  const s = preset.settings;
  const { printerProfiles, teamMaterials } = team ?? NO_TEAM;
  const profile = printerProfiles.find((p) => p.id === preset.printerProfileId && p.process === s.process);
  const material = s.materialTuning
    ? teamMaterials.find((m) => m.name === s.materialTuning!.name && m.baseMaterial === s.material)
    : undefined;
  return {
    ...current,
    joint: s.joint,
    process: s.process,
    material: s.material,
    fit: s.fit,
    clearanceMode: s.clearance === undefined ? 'derived' : 'set',
    clearance: s.clearance ?? current.clearance ?? DEFAULT_DESIGN.clearance,
    calibrationOffset: s.calibrationOffset,
    calibrationNote:
      s.calibrationOffset !== undefined && s.calibrationSource
        ? { offset: s.calibrationOffset, source: s.calibrationSource }
        : undefined,
    printerProfileId: profile?.id ?? '',
    teamMaterialId: material?.id ?? '',
    materialTuning: material ? undefined : s.materialTuning,
    format: s.format,
    chordTolerance: s.chordTolerance,
    key: s.joint === 'key' ? { ...s.key } : current.key,
    dovetail: s.joint === 'dovetail' ? { ...s.dovetail } : current.dovetail,
  };
}

/**
 * The form's values with a ready-made setup in place, its face included. The printer profile chosen stays if
 * it prints the setup's process; nothing of the team's is taken from the setup.
 */
export function valuesFromStarter(
  current: DesignValues,
  starter: StarterSetup,
  team: TeamChoices | null,
): DesignValues {
  const settings = withoutFace(kitRequestSchema.parse({ ...starter.settings, face: starter.face }));
  const values = valuesFromPreset(current, { settings, printerProfileId: null }, team);
  const profile = chosenProfile({ ...values, printerProfileId: current.printerProfileId }, team);
  return { ...values, printerProfileId: profile?.id ?? '', face: { ...current.face, ...starter.face } };
}

/** A kit request's settings as a preset keeps them: everything but the face. */
export function settingsOf(request: KitRequest): PresetSettingsInput {
  const { face: _face, ...settings } = request;
  return settings as PresetSettingsInput;
}

/**
 * The kit request with the team material's tuning for its fit class (shared/library/team-material-tuning.ts),
 * as the server applies it; unchanged without one.
 */
export function withTeamMaterial(
  request: KitRequest,
  material: Pick<TeamMaterial, 'name' | 'clearanceAdjustments'> | null,
): KitRequest {
  return material ? { ...request, materialTuning: teamMaterialTuning(material, request.fit) } : request;
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

/** What a preset saves of the form: its request with the team material's tuning, before any calibration. */
export function presetRequest(values: DesignValues, team: TeamChoices | null): KitRequest {
  return withTeamMaterial(toKitRequest(values), chosenTeamMaterial(values, team));
}

/** The request the kit is built from, in the preview and on the server: team material, then calibration. */
export function kitRequestOf(values: DesignValues, team: TeamChoices | null): KitRequest {
  return withProfileCalibration(presetRequest(values, team), chosenProfile(values, team));
}

// Any valid face stands in while settings are checked; the face is no part of a preset.
const STAND_IN_FACE = { shape: 'rect', width: 100, height: 100 } as const;

/** Settings with every default applied, in the schema's key order, as text; "invalid" when they are not. */
function settingsText(settings: unknown, printerProfileId: string | null): string {
  const parsed = kitRequestSchema.safeParse({ ...(settings as object), face: STAND_IN_FACE });
  const text = parsed.success ? JSON.stringify(withoutFace(parsed.data)) : 'invalid';
  return `${text}|${printerProfileId ?? ''}`;
}

/**
 * What a preset would save of the form (settings and printer profile), normalised, so it can be compared
 * with {@link savedPresetText}: the screen says whether the design still matches the preset it came from.
 */
export function presetText(values: DesignValues, team: TeamChoices | null): string {
  return settingsText(settingsOf(presetRequest(values, team)), chosenProfile(values, team)?.id ?? null);
}

/**
 * A preset as it is saved, normalised like {@link presetText}. Comparing with the preset as saved, not as the
 * form took it in, shows anything the form could not keep (a printer profile that is gone, a team material
 * whose adjustment changed since) as a change.
 */
export function savedPresetText(preset: Pick<Preset, 'settings' | 'printerProfileId'>): string {
  return settingsText(preset.settings, preset.printerProfileId);
}
