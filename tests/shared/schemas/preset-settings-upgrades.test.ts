import { describe, expect, it } from 'vitest';
import helmet from '../../fixtures/presets/v1-helmet-seam.json';
import spar from '../../fixtures/presets/v1-wing-spar.json';
import {
  PRESET_SETTINGS_VERSION,
  PresetUpgradeError,
  upgradePresetSettings,
  type PresetSettingsUpgrade,
} from '../../../shared/schemas/preset-settings-upgrades';
import { presetSettingsSchema } from '../../../shared/schemas/preset-settings';

// Every stored shape ever written, oldest first; a new schema version adds its fixture here.
const fixtures = [helmet, spar];

describe('upgradePresetSettings', () => {
  it.each(fixtures.map((f) => [f.settings.joint, f] as const))(
    'upgrades the %s fixture to settings the current schema accepts',
    (_joint, fixture) => {
      const upgraded = upgradePresetSettings(fixture);
      expect(upgraded.schemaVersion).toBe(PRESET_SETTINGS_VERSION);
      expect(presetSettingsSchema.safeParse(upgraded.settings).success).toBe(true);
    },
  );

  it('keeps version 1 settings as they are when no step applies', () => {
    expect(upgradePresetSettings(helmet).settings).toEqual(helmet.settings);
  });

  it('runs each step once, in order, without changing its input', () => {
    // A made-up chain of two steps standing in for real schema changes: v1 → v2 renames, v2 → v3 adds.
    const steps: PresetSettingsUpgrade[] = [
      ({ fit, ...rest }) => ({ ...rest, fitClass: fit }),
      (s) => ({ ...s, note: `was ${String(s.fitClass)}` }),
    ];
    const input = { schemaVersion: 1, settings: { fit: 'snug', material: 'PLA' } };
    const frozen = structuredClone(input);
    expect(upgradePresetSettings(input, steps)).toEqual({
      schemaVersion: 3,
      settings: { material: 'PLA', fitClass: 'snug', note: 'was snug' },
    });
    expect(upgradePresetSettings({ schemaVersion: 2, settings: { fitClass: 'press' } }, steps).settings).toEqual({
      fitClass: 'press',
      note: 'was press',
    });
    expect(input).toEqual(frozen);
  });

  it('refuses settings from a later Seamwright, and a version that is not a whole number from 1', () => {
    expect(() => upgradePresetSettings({ schemaVersion: PRESET_SETTINGS_VERSION + 1, settings: {} })).toThrow(
      PresetUpgradeError,
    );
    expect(() => upgradePresetSettings({ schemaVersion: PRESET_SETTINGS_VERSION + 1, settings: {} })).toThrow(
      /saved by a later Seamwright/,
    );
    for (const bad of [0, 1.5, '1', undefined])
      expect(() => upgradePresetSettings({ schemaVersion: bad, settings: {} })).toThrow(/whole number/);
    expect(() => upgradePresetSettings({ schemaVersion: 1, settings: [] })).toThrow(/must be an object/);
  });
});
