import type { AppContext } from '../../app-context';
import type { SessionUser } from '../../auth/sessions';
import { AppError } from '../../errors/app-error';
import { parseWith } from '../../http/parse';
import {
  PRESETS_FILE_FORMAT,
  PRESETS_FILE_VERSION,
  presetsFileSchema,
  type PresetImportReport,
  type PresetsFile,
} from '../../../shared/schemas/preset-transfer';
import { requireTeamRole } from '../teams/team-access';
import { listProfiles } from '../printer-profiles/printer-profiles.repository';
import { planItem, type PlannedItem } from './import-plan';
import { toPreset } from './preset-mapping';
import { createWithFirstVersion } from './preset-writes';
import * as repo from './presets.repository';

/** The team's presets as one file of Seamwright's presets format; any member. */
export async function exportPresets(
  ctx: AppContext,
  user: SessionUser,
  teamId: string,
): Promise<{ fileName: string; file: PresetsFile }> {
  const team = await requireTeamRole(ctx.db, teamId, user, 'viewer');
  const rows = await repo.allPresets(ctx.db, teamId);
  const presets = rows.map(toPreset).map((p) => ({
    name: p.name,
    description: p.description,
    tags: p.tags,
    printerProfile: p.printerProfileName,
    schemaVersion: p.schemaVersion,
    settings: p.settings,
  }));
  const slug =
    team.name
      .toLowerCase()
      .replace(/[^a-z0-9]+/g, '-')
      .replace(/^-|-$/g, '') || 'team';
  const file = {
    format: PRESETS_FILE_FORMAT,
    formatVersion: PRESETS_FILE_VERSION,
    exportedAt: new Date().toISOString(),
    team: team.name,
    presets,
  } as const;
  return { fileName: `${slug}-presets.json`, file };
}

/** Refuses an import before its upload is read when the user may not import (editors and owners may). */
export async function checkMayImport(ctx: AppContext, user: SessionUser, teamId: string): Promise<void> {
  await requireTeamRole(ctx.db, teamId, user, 'editor');
}

function readFile(file: { buffer: Buffer } | undefined): PresetsFile {
  if (!file) throw new AppError('BAD_REQUEST', 'Send the presets file as multipart/form-data in a field named "file".');
  let json: unknown;
  try {
    json = JSON.parse(file.buffer.toString('utf8'));
  } catch {
    throw new AppError('BAD_REQUEST', 'The presets file is not valid JSON.');
  }
  return parseWith(presetsFileSchema, json, 'presets file');
}

function reportOf(planned: PlannedItem[], written: boolean): PresetImportReport {
  const items = planned.map((p) => p.report);
  const countOf = (o: string) => items.filter((i) => i.outcome === o).length;
  return { written, added: countOf('added'), renamed: countOf('renamed'), refused: countOf('refused'), items };
}

/**
 * Imports a presets file: every preset is checked and upgraded before anything is written; if any is refused,
 * nothing is written and the 400 carries the whole report; otherwise all are written in one transaction.
 * Name clashes are renamed "<name> (2)"; editors and owners.
 */
export function importPresets(
  ctx: AppContext,
  user: SessionUser,
  teamId: string,
  upload: { buffer: Buffer; originalname?: string } | undefined,
): Promise<PresetImportReport> {
  return ctx.db.transaction(async (tx) => {
    await requireTeamRole(tx, teamId, user, 'editor');
    const file = readFile(upload);
    const taken = await repo.presetNames(tx, teamId);
    const { items: profiles } = await listProfiles(tx, teamId, { sort: 'name', order: 'asc', page: 1, pageSize: 1000 });
    const byName = new Map(profiles.map((p) => [p.name.toLowerCase(), p.id]));
    const planned = file.presets.map((raw, i) => planItem(raw, i, taken, byName));
    const refused = planned.filter((p) => !p.fields);
    if (refused.length > 0) {
      throw new AppError(
        'VALIDATION_FAILED',
        `Nothing was imported: ${refused.length} of ${planned.length} presets ${refused.length === 1 ? 'was' : 'were'} refused. Fix ${refused.length === 1 ? 'it' : 'them'} and import the file again.`,
        refused.map((p) => ({ path: `presets.${p.report.index}`, message: p.report.reason ?? 'refused' })),
        { report: reportOf(planned, false) },
      );
    }
    const source = upload?.originalname ? `imported from ${upload.originalname}` : 'imported';
    for (const p of planned) await createWithFirstVersion(tx, user, teamId, p.fields!, source);
    return reportOf(planned, true);
  });
}
