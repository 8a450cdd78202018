import type { AppContext } from '../../app-context';
import type { SessionUser } from '../../auth/sessions';
import { AppError } from '../../errors/app-error';
import type { Page } from '../../../shared/schemas/library-list';
import type { ParsedPresetInput, ParsedPresetListQuery, Preset, PresetSummary } from '../../../shared/schemas/preset';
import { PRESET_SETTINGS_VERSION } from '../../../shared/schemas/preset-settings-upgrades';
import type { PresetSettings } from '../../../shared/schemas/preset-settings';
import { requireTeamRole } from '../teams/team-access';
import { freeName, withUniqueName } from './library-query';
import { toPreset, toSummary } from './preset-mapping';
import { createWithFirstVersion, profileNameOf, saveVersion } from './preset-writes';
import * as repo from './presets.repository';

const NOT_FOUND = 'There is no such preset in this team.';

/** The fields a preset edit may change (settings already checked by the shared schema). */
export interface PresetChange {
  baseVersion: number;
  name?: string;
  description?: string;
  tags?: string[];
  printerProfileId?: string | null;
  settings?: PresetSettings;
}

/** A page of the team's presets with search, filters and sort; any member. */
export async function listPresets(
  ctx: AppContext,
  user: SessionUser,
  teamId: string,
  query: ParsedPresetListQuery,
): Promise<Page<PresetSummary>> {
  await requireTeamRole(ctx.db, teamId, user, 'viewer');
  const { rows, total } = await repo.listPresets(ctx.db, teamId, query);
  return { items: rows.map(toSummary), total, page: query.page, pageSize: query.pageSize };
}

/** One preset with its current version and settings; any member. */
export async function getPreset(ctx: AppContext, user: SessionUser, teamId: string, id: string): Promise<Preset> {
  await requireTeamRole(ctx.db, teamId, user, 'viewer');
  const row = await repo.findPreset(ctx.db, teamId, id);
  if (!row) throw new AppError('NOT_FOUND', NOT_FOUND);
  return toPreset(row);
}

/** Creates a preset at version 1; editors and owners. A name the team already uses answers 409. */
export function createPreset(
  ctx: AppContext,
  user: SessionUser,
  teamId: string,
  input: ParsedPresetInput,
): Promise<Preset> {
  return withUniqueName('preset', input.name, () =>
    ctx.db.transaction(async (tx) => {
      await requireTeamRole(tx, teamId, user, 'editor');
      await profileNameOf(tx, teamId, input.printerProfileId);
      const fields = {
        ...input,
        settings: input.settings as Record<string, unknown>,
        schemaVersion: PRESET_SETTINGS_VERSION,
      };
      const id = await createWithFirstVersion(tx, user, teamId, fields);
      return toPreset((await repo.findPreset(tx, teamId, id))!);
    }),
  );
}

/** Saves an edit as a new version; editors and owners. A stale `baseVersion` answers 409 with the current preset. */
export function updatePreset(
  ctx: AppContext,
  user: SessionUser,
  teamId: string,
  id: string,
  patch: PresetChange,
): Promise<Preset> {
  const { baseVersion, settings, ...fields } = patch;
  return withUniqueName('preset', patch.name ?? '', () =>
    ctx.db.transaction(async (tx) => {
      await requireTeamRole(tx, teamId, user, 'editor');
      return saveVersion(tx, user, teamId, id, baseVersion, (current) => ({
        ...current,
        ...fields,
        ...(settings ? { settings: settings as Record<string, unknown>, schemaVersion: PRESET_SETTINGS_VERSION } : {}),
      }));
    }),
  );
}

/** Copies a preset (current version) under a new name, as a new preset at version 1; editors and owners. */
export function duplicatePreset(
  ctx: AppContext,
  user: SessionUser,
  teamId: string,
  id: string,
  name?: string,
): Promise<Preset> {
  return ctx.db.transaction(async (tx) => {
    await requireTeamRole(tx, teamId, user, 'editor');
    const source = await repo.findPreset(tx, teamId, id);
    if (!source) throw new AppError('NOT_FOUND', NOT_FOUND);
    const copy = toPreset(source);
    const newName = name ?? freeName(`${copy.name} (copy)`, await repo.presetNames(tx, teamId));
    const { description, tags, printerProfileId, schemaVersion } = copy;
    const fields = {
      name: newName,
      description,
      tags,
      printerProfileId,
      schemaVersion,
      settings: copy.settings as Record<string, unknown>,
    };
    const newId = await withUniqueName('preset', newName, () =>
      createWithFirstVersion(tx, user, teamId, fields, `duplicated from "${copy.name}" version ${copy.version}`),
    );
    return toPreset((await repo.findPreset(tx, teamId, newId))!);
  });
}

/** Archives or brings back a preset (hidden from the default list, kept with its versions); editors and owners. */
export async function setPresetArchived(
  ctx: AppContext,
  user: SessionUser,
  teamId: string,
  id: string,
  archived: boolean,
) {
  await requireTeamRole(ctx.db, teamId, user, 'editor');
  if (!(await repo.setArchived(ctx.db, teamId, id, archived))) throw new AppError('NOT_FOUND', NOT_FOUND);
  return toPreset((await repo.findPreset(ctx.db, teamId, id))!);
}

/** Deletes a preset and all its versions; owners only. Kit history keeps its copy of the name. */
export async function deletePreset(ctx: AppContext, user: SessionUser, teamId: string, id: string): Promise<void> {
  await requireTeamRole(ctx.db, teamId, user, 'owner');
  if (!(await repo.deletePreset(ctx.db, teamId, id))) throw new AppError('NOT_FOUND', NOT_FOUND);
}
