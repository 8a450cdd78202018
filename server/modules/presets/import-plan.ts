import { z } from 'zod';
import { libraryNameSchema, notesSchema, tagsSchema } from '../../../shared/schemas/library-fields';
import { presetFileItemSchema, type PresetImportItem } from '../../../shared/schemas/preset-transfer';
import { presetSettingsSchema } from '../../../shared/schemas/preset-settings';
import { PresetUpgradeError, upgradePresetSettings } from '../../../shared/schemas/preset-settings-upgrades';
import type { PresetFields } from './presets.repository';
import { freeName } from './library-query';

/** One preset of a file, checked: what to write (absent when refused) and its report row. */
export interface PlannedItem {
  report: PresetImportItem;
  fields?: PresetFields;
}

// The first problem of a zod failure, with its path, in one line.
function firstIssue(error: z.ZodError, prefix: string): string {
  const issue = error.issues[0];
  const path = [prefix, ...(issue?.path.map(String) ?? [])].filter(Boolean).join('.');
  const more = error.issues.length > 1 ? ` (and ${error.issues.length - 1} more)` : '';
  return `${path ? `${path}: ` : ''}${issue?.message ?? 'invalid'}${more}`;
}

/**
 * Checks and upgrades one preset of a file without writing anything: its fields, its settings (upgraded from
 * their schemaVersion, then checked by the kit request's rules), its printer profile by name, and its name
 * against `taken` (lower-cased names already used, to which the chosen name is added).
 */
export function planItem(raw: unknown, index: number, taken: Set<string>, profiles: Map<string, string>): PlannedItem {
  const rawName =
    typeof raw === 'object' && raw !== null && typeof (raw as { name?: unknown }).name === 'string'
      ? (raw as { name: string }).name
      : '';
  const refuse = (reason: string): PlannedItem => ({
    report: { index, name: rawName, outcome: 'refused', reason, notes: [] },
  });
  const item = presetFileItemSchema.safeParse(raw);
  if (!item.success) return refuse(firstIssue(item.error, ''));
  const name = libraryNameSchema.safeParse(item.data.name);
  if (!name.success) return refuse(firstIssue(name.error, 'name'));
  const description = notesSchema.safeParse(item.data.description ?? '');
  if (!description.success) return refuse(firstIssue(description.error, 'description'));
  const tags = tagsSchema.safeParse(item.data.tags ?? []);
  if (!tags.success) return refuse(firstIssue(tags.error, 'tags'));
  let upgraded;
  try {
    upgraded = upgradePresetSettings({ schemaVersion: item.data.schemaVersion, settings: item.data.settings });
  } catch (err) {
    if (err instanceof PresetUpgradeError) return refuse(err.message);
    throw err;
  }
  const settings = presetSettingsSchema.safeParse(upgraded.settings);
  if (!settings.success) return refuse(firstIssue(settings.error, 'settings'));

  const notes: string[] = [];
  let printerProfileId: string | null = null;
  const wantedProfile = item.data.printerProfile;
  if (wantedProfile) {
    printerProfileId = profiles.get(wantedProfile.toLowerCase()) ?? null;
    if (!printerProfileId) notes.push(`this team has no printer profile "${wantedProfile}": imported without one`);
  }
  const savedAs = freeName(name.data, taken);
  taken.add(savedAs.toLowerCase());
  const renamed = savedAs !== name.data;
  return {
    report: {
      index,
      name: name.data,
      outcome: renamed ? 'renamed' : 'added',
      savedAs,
      ...(renamed ? { reason: `this team already has a preset named "${name.data}"` } : {}),
      notes,
    },
    fields: {
      name: savedAs,
      description: description.data,
      tags: tags.data,
      printerProfileId,
      schemaVersion: upgraded.schemaVersion,
      settings: settings.data as Record<string, unknown>,
    },
  };
}
