/**
 * One upgrade of stored preset settings from one schema version to the next: pure, it returns a new object
 * and never mutates its input, never reads the clock or the current schema's defaults (so an old preset
 * upgrades the same way forever).
 */
export type PresetSettingsUpgrade = (settings: Readonly<Record<string, unknown>>) => Record<string, unknown>;

/**
 * The upgrade steps, in order: step i turns schemaVersion i + 1 into i + 2. Version 1 is the kit request of
 * issue 3 without its face; no change has been made to it since, so there is no step yet. A change to the
 * kit request that an old preset would fail adds a step here and a fixture of the old shape under
 * tests/fixtures/presets/.
 */
export const presetSettingsUpgrades: readonly PresetSettingsUpgrade[] = [];

/** The schemaVersion that settings are stored with today. */
export const PRESET_SETTINGS_VERSION = presetSettingsUpgrades.length + 1;

/** Stored settings that cannot be upgraded: a version from a later Seamwright, or not a version at all. */
export class PresetUpgradeError extends Error {
  constructor(message: string) {
    super(message);
    this.name = 'PresetUpgradeError';
  }
}

/**
 * Brings stored settings up to the current schema version by running each step in turn.
 *
 * @param stored - `schemaVersion` (a whole number from 1) and the settings as stored then
 * @param steps - the upgrade steps; default {@link presetSettingsUpgrades} (tests pass their own chain)
 * @returns the settings at version `steps.length + 1` and that version; the input is not changed
 * @throws PresetUpgradeError for a version below 1, not whole, or newer than this Seamwright knows
 * @example
 * upgradePresetSettings({ schemaVersion: 1, settings }).schemaVersion; // PRESET_SETTINGS_VERSION
 */
export function upgradePresetSettings(
  stored: { schemaVersion: unknown; settings: unknown },
  steps: readonly PresetSettingsUpgrade[] = presetSettingsUpgrades,
): { schemaVersion: number; settings: Record<string, unknown> } {
  const current = steps.length + 1;
  const from = stored.schemaVersion;
  if (typeof from !== 'number' || !Number.isInteger(from) || from < 1) {
    throw new PresetUpgradeError(
      `schemaVersion must be a whole number from 1 to ${current}; it is ${JSON.stringify(from)}`,
    );
  }
  if (from > current) {
    throw new PresetUpgradeError(
      `these settings were saved by a later Seamwright (schemaVersion ${from}); this one reads up to ${current}`,
    );
  }
  if (typeof stored.settings !== 'object' || stored.settings === null || Array.isArray(stored.settings)) {
    throw new PresetUpgradeError('settings must be an object');
  }
  let settings = { ...(stored.settings as Record<string, unknown>) };
  for (let version = from; version < current; version += 1) settings = steps[version - 1]!(settings);
  return { schemaVersion: current, settings };
}
