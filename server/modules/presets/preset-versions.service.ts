import type { AppContext } from '../../app-context';
import type { SessionUser } from '../../auth/sessions';
import { AppError } from '../../errors/app-error';
import type { Preset } from '../../../shared/schemas/preset';
import type { PresetSettings } from '../../../shared/schemas/preset-settings';
import type { PresetVersion, PresetVersionList, PresetVersionSummary } from '../../../shared/schemas/preset-version';
import { findProfile } from '../printer-profiles/printer-profiles.repository';
import { requireTeamRole } from '../teams/team-access';
import { personOf, withUniqueName } from './library-query';
import { currentSettings } from './preset-mapping';
import { saveVersion } from './preset-writes';
import * as repo from './presets.repository';
import * as versions from './preset-versions.repository';

const toSummary = (v: versions.VersionRow): PresetVersionSummary => ({
  version: v.version,
  createdAt: v.createdAt.toISOString(),
  author: personOf(v.authorId, v.authorName),
  changes: v.changes,
  restoredFrom: v.restoredFrom,
});

async function requirePreset(db: AppContext['db'], teamId: string, presetId: string) {
  const row = await repo.findPreset(db, teamId, presetId);
  if (!row) throw new AppError('NOT_FOUND', 'There is no such preset in this team.');
  return row;
}

/** Every version of a preset, newest first, with what changed in plain words; any member. */
export async function listPresetVersions(
  ctx: AppContext,
  user: SessionUser,
  teamId: string,
  presetId: string,
): Promise<PresetVersionList> {
  await requireTeamRole(ctx.db, teamId, user, 'viewer');
  await requirePreset(ctx.db, teamId, presetId);
  return { items: (await versions.listVersions(ctx.db, presetId)).map(toSummary) };
}

/** One version exactly as it was saved (settings upgraded to today's schema); any member. */
export async function getPresetVersion(
  ctx: AppContext,
  user: SessionUser,
  teamId: string,
  presetId: string,
  version: number,
): Promise<PresetVersion> {
  await requireTeamRole(ctx.db, teamId, user, 'viewer');
  await requirePreset(ctx.db, teamId, presetId);
  const found = await versions.findVersion(ctx.db, presetId, version);
  if (!found) throw new AppError('NOT_FOUND', `This preset has no version ${version}.`);
  const { schemaVersion, settings } = currentSettings(found);
  return {
    ...toSummary(found),
    name: found.name,
    description: found.description,
    tags: found.tags,
    printerProfileId: found.printerProfileId,
    schemaVersion,
    settings: settings as PresetSettings,
  };
}

/**
 * Brings an old version back as a new version (history is never rewritten); editors and owners. The
 * restore is based on `baseVersion` like any save, so it cannot overwrite a save it has not seen. A printer
 * profile deleted since is left out rather than refused.
 */
export function restorePresetVersion(
  ctx: AppContext,
  user: SessionUser,
  teamId: string,
  presetId: string,
  version: number,
  baseVersion: number,
): Promise<Preset> {
  return ctx.db.transaction(async (tx) => {
    await requireTeamRole(tx, teamId, user, 'editor');
    await requirePreset(tx, teamId, presetId);
    const old = await versions.findVersion(tx, presetId, version);
    if (!old) throw new AppError('NOT_FOUND', `This preset has no version ${version}.`);
    const upgraded = currentSettings(old);
    const profileStillThere =
      old.printerProfileId !== null && (await findProfile(tx, teamId, old.printerProfileId)) !== null;
    return withUniqueName('preset', old.name, () =>
      saveVersion(
        tx,
        user,
        teamId,
        presetId,
        baseVersion,
        () => ({
          name: old.name,
          description: old.description,
          tags: old.tags,
          printerProfileId: profileStillThere ? old.printerProfileId : null,
          ...upgraded,
        }),
        version,
      ),
    );
  });
}
