import type { AppContext } from '../../app-context';
import type { SessionUser } from '../../auth/sessions';
import { AppError } from '../../errors/app-error';
import type { Geometry } from '../../geometry/geometry';
import type { KitCheck, KitFileHash } from '../../../shared/schemas/kit-history';
import { kitRequestSchema } from '../../../shared/schemas/kit-request';
import { requireTeamRole } from '../teams/team-access';
import { ENGINE_VERSION } from './engine-version';
import * as repo from './kit-history.repository';

const NOT_FOUND = 'There is no such kit in this team’s history.';

type Rebuilt = { ok: true; hashes: KitFileHash[]; zip: Uint8Array } | { ok: false; reason: string };

// The stored request is a resolved one and parses again to itself; a later Seamwright may refuse it.
async function rebuild(geometry: Geometry, request: unknown): Promise<Rebuilt> {
  const parsed = kitRequestSchema.safeParse(request);
  if (!parsed.success)
    return { ok: false, reason: parsed.error.issues[0]?.message ?? 'the request is no longer valid' };
  try {
    const kit = await geometry.kitZip(parsed.data);
    return { ok: true, hashes: kit.hashes, zip: kit.zip };
  } catch (err) {
    return { ok: false, reason: err instanceof Error ? err.message : String(err) };
  }
}

function compare(recorded: KitFileHash[], current: KitFileHash[]): KitCheck['files'] {
  const now = new Map(current.map((f) => [f.name, f.sha256]));
  const rows: KitCheck['files'] = recorded.map((f) => {
    const sha = now.get(f.name) ?? null;
    return {
      name: f.name,
      recorded: f.sha256,
      current: sha,
      status: sha === null ? 'missing' : sha === f.sha256 ? 'same' : 'changed',
    };
  });
  for (const f of current)
    if (!recorded.some((r) => r.name === f.name))
      rows.push({ name: f.name, recorded: null, current: f.sha256, status: 'new' });
  return rows;
}

function message(files: KitCheck['files'], recordedEngine: string): string {
  const differing = files.filter((f) => f.status !== 'same');
  if (differing.length === 0) {
    return `Rebuilt with Seamwright ${ENGINE_VERSION}: all ${files.length} STL files are byte-identical to the original download.`;
  }
  const words = { changed: 'has different geometry', missing: 'is no longer produced', new: 'is new', same: '' };
  const list = differing.map((f) => `${f.name} ${words[f.status]}`).join('; ');
  return `This version of Seamwright (${ENGINE_VERSION}) builds this kit differently from the one that built it (${recordedEngine}): ${list}. Both are offered: the original zip as it was downloaded, and the kit as it is built now.`;
}

async function entryOf(ctx: AppContext, user: SessionUser, teamId: string, id: string) {
  await requireTeamRole(ctx.db, teamId, user, 'viewer');
  const row = await repo.findKitDownload(ctx.db, teamId, id);
  if (!row) throw new AppError('NOT_FOUND', NOT_FOUND);
  return row;
}

/** Rebuilds a recorded kit and compares every STL with its recorded SHA-256; any member. */
export async function checkKit(ctx: AppContext, user: SessionUser, teamId: string, id: string): Promise<KitCheck> {
  const row = await entryOf(ctx, user, teamId, id);
  const base = { recordedEngine: row.engineVersion, currentEngine: ENGINE_VERSION, original: true };
  const rebuilt = await rebuild(ctx.geometry, row.request);
  if (!rebuilt.ok) {
    const files = row.files.map((f) => ({
      name: f.name,
      recorded: f.sha256,
      current: null,
      status: 'missing' as const,
    }));
    return {
      ...base,
      identical: false,
      files,
      message: `This version of Seamwright (${ENGINE_VERSION}) no longer builds this request: ${rebuilt.reason}. The original zip as it was downloaded is still offered.`,
    };
  }
  const files = compare(row.files, rebuilt.hashes);
  return {
    ...base,
    identical: files.every((f) => f.status === 'same'),
    files,
    message: message(files, row.engineVersion),
  };
}

/**
 * A recorded kit again: "current" rebuilds it now (and says whether it is byte-identical), "original" is the
 * zip exactly as it was downloaded; any member.
 */
export async function downloadKit(
  ctx: AppContext,
  user: SessionUser,
  teamId: string,
  id: string,
  variant: 'current' | 'original',
) {
  const row = await entryOf(ctx, user, teamId, id);
  if (variant === 'original') {
    const zip = await repo.findKitZip(ctx.db, teamId, id);
    return { fileName: row.fileName, zip: zip!, identical: true };
  }
  const rebuilt = await rebuild(ctx.geometry, row.request);
  if (!rebuilt.ok) {
    throw new AppError(
      'GEOMETRY_IMPOSSIBLE',
      `This version of Seamwright no longer builds this kit: ${rebuilt.reason}. Download the original instead.`,
    );
  }
  const identical = compare(row.files, rebuilt.hashes).every((f) => f.status === 'same');
  const fileName = identical ? row.fileName : row.fileName.replace(/\.zip$/, `-rebuilt-${ENGINE_VERSION}.zip`);
  return { fileName, zip: rebuilt.zip, identical };
}
