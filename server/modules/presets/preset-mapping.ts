import { upgradePresetSettings } from '../../../shared/schemas/preset-settings-upgrades';
import type { Preset, PresetSummary } from '../../../shared/schemas/preset';
import type { PresetSettings } from '../../../shared/schemas/preset-settings';
import { personOf } from './library-query';
import type { PresetFields, PresetRow } from './presets.repository';

/** Stored settings brought up to today's schema version (old presets keep loading). */
export function currentSettings(stored: { schemaVersion: number; settings: unknown }) {
  return upgradePresetSettings(stored);
}

/** A preset row as every preset read answers it. */
export function toPreset(row: PresetRow): Preset {
  const { schemaVersion, settings } = currentSettings(row);
  return {
    id: row.id,
    teamId: row.teamId,
    name: row.name,
    description: row.description,
    tags: row.tags,
    printerProfileId: row.printerProfileId,
    printerProfileName: row.printerProfileName,
    version: row.version,
    schemaVersion,
    settings: settings as PresetSettings,
    archived: row.archived,
    createdAt: row.createdAt.toISOString(),
    createdBy: personOf(row.createdById, row.createdByName),
    updatedAt: row.updatedAt.toISOString(),
    updatedBy: personOf(row.updatedById, row.updatedByName),
  };
}

/** A preset row as the list shows it. */
export function toSummary(row: PresetRow): PresetSummary {
  const { settings, teamId: _t, ...rest } = toPreset(row);
  return { ...rest, joint: settings.joint, material: settings.material, fit: settings.fit };
}

/** The stored fields of a preset row (what a version copies). */
export function fieldsOf(row: PresetRow): PresetFields {
  const { schemaVersion, settings } = currentSettings(row);
  return {
    name: row.name,
    description: row.description,
    tags: row.tags,
    printerProfileId: row.printerProfileId,
    schemaVersion,
    settings,
  };
}
