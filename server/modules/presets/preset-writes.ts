import type { SessionUser } from '../../auth/sessions';
import type { Executor } from '../../db/executor';
import { AppError } from '../../errors/app-error';
import { findProfile } from '../printer-profiles/printer-profiles.repository';
import { describeChanges } from './describe-changes';
import { fieldsOf, toPreset } from './preset-mapping';
import * as repo from './presets.repository';
import { insertVersion } from './preset-versions.repository';

/** The printer profile's name, after checking that it belongs to the team; null for no profile. */
export async function profileNameOf(db: Executor, teamId: string, profileId: string | null): Promise<string | null> {
  if (profileId === null) return null;
  const profile = await findProfile(db, teamId, profileId);
  if (!profile) {
    throw new AppError('VALIDATION_FAILED', 'The printer profile chosen is not one of this team’s.', [
      { path: 'printerProfileId', message: 'Choose one of this team’s printer profiles, or none.' },
    ]);
  }
  return profile.name;
}

/**
 * Saves a new version of a preset inside the caller's transaction: locks the row, refuses with 409 (and the
 * current preset) when `baseVersion` is not the current version, writes the new state, and records the
 * version with what changed in plain words. Nothing changed → the preset is returned as it is, no version.
 */
export async function saveVersion(
  tx: Executor,
  user: SessionUser,
  teamId: string,
  presetId: string,
  baseVersion: number,
  change: (current: repo.PresetFields) => repo.PresetFields,
  restoredFrom: number | null = null,
) {
  if (!(await repo.lockPreset(tx, teamId, presetId)))
    throw new AppError('NOT_FOUND', 'There is no such preset in this team.');
  const row = (await repo.findPreset(tx, teamId, presetId))!;
  if (row.version !== baseVersion) {
    const by = row.updatedByName ? ` by ${row.updatedByName}` : '';
    throw new AppError(
      'CONFLICT',
      `This preset was saved as version ${row.version}${by} after you opened version ${baseVersion}; your changes were not saved. The current version is attached: compare and save again.`,
      undefined,
      { current: toPreset(row) },
    );
  }
  const before = fieldsOf(row);
  const after = change(before);
  const afterProfileName = await profileNameOf(tx, teamId, after.printerProfileId);
  const changes = describeChanges(
    { ...before, printerProfileName: row.printerProfileName },
    { ...after, printerProfileName: afterProfileName },
  );
  if (changes.length === 0 && restoredFrom === null) return toPreset(row);
  const version = row.version + 1;
  await repo.updatePreset(tx, presetId, user.id, version, after);
  const words = restoredFrom === null ? changes : [`restored version ${restoredFrom}`, ...changes];
  await insertVersion(tx, { presetId, version, ...after, changes: words, restoredFrom, author: user });
  return toPreset((await repo.findPreset(tx, teamId, presetId))!);
}

/** Creates a preset with its first version, inside the caller's transaction. */
export async function createWithFirstVersion(
  tx: Executor,
  user: SessionUser,
  teamId: string,
  fields: repo.PresetFields,
  firstChange = 'created',
): Promise<string> {
  const id = await repo.insertPreset(tx, teamId, user.id, fields);
  await insertVersion(tx, {
    presetId: id,
    version: 1,
    ...fields,
    changes: [firstChange],
    restoredFrom: null,
    author: user,
  });
  return id;
}
