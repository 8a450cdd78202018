import type { Preset, PresetInput, PresetPatch } from '../../../../shared/schemas/preset';
import type { TeamMaterial } from '../../../../shared/schemas/material';
import type { PrinterProfile } from '../../../../shared/schemas/printer-profile';
import type { TeamChoices } from './preset-values';

/** A preset as the design screen lists it. */
export interface PresetChoice {
  readonly id: string;
  readonly name: string;
  readonly version: number;
}

/**
 * What the design screen may use of the team library when someone is signed in: the current team's
 * presets and printer profiles, and the calls that load and save presets. The app's route builds it from
 * the presets and printer-profiles features, so the design feature does not import them.
 */
export interface DesignLibrary extends TeamChoices {
  readonly teamId: string;
  readonly teamName: string;
  /** The presets, printer profiles and materials have loaded: a preset can be taken in without losing its printer. */
  readonly ready: boolean;
  /** Editors and owners save presets; viewers only start from them. */
  readonly canEdit: boolean;
  readonly presets: readonly PresetChoice[];
  readonly printerProfiles: readonly PrinterProfile[];
  readonly teamMaterials: readonly TeamMaterial[];
  loadPreset(id: string): Promise<Preset>;
  createPreset(body: PresetInput): Promise<Preset>;
  /** The saved preset, or, when the save was based on an older version (409), the preset as it is now. */
  updatePreset(id: string, patch: PresetPatch): Promise<{ saved: Preset } | { conflict: Preset }>;
}

/**
 * The preset the design on screen came from, and its settings as they were when it was loaded or saved
 * (`settingsText`), so the screen can tell whether the design still matches it.
 */
export interface PresetOrigin {
  readonly id: string;
  readonly name: string;
  readonly version: number;
  readonly settingsText: string;
}
