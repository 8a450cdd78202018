import { and, desc, eq } from 'drizzle-orm';
import type { Executor } from '../../db/executor';
import { presetVersions } from '../../db/schema';
import type { PresetFields } from './presets.repository';
import { MAX_VERSION } from '../../../shared/schemas/library-fields';

export interface NewVersion extends PresetFields {
  presetId: string;
  version: number;
  changes: string[];
  restoredFrom: number | null;
  author: { id: string; name: string };
}

export async function insertVersion(db: Executor, v: NewVersion): Promise<void> {
  const { author } = v;
  await db.insert(presetVersions).values({
    presetId: v.presetId,
    version: v.version,
    name: v.name,
    description: v.description,
    tags: v.tags,
    printerProfileId: v.printerProfileId,
    schemaVersion: v.schemaVersion,
    settings: v.settings,
    changes: v.changes,
    restoredFrom: v.restoredFrom,
    authorId: author.id,
    authorName: author.name,
  });
}

/** Every version of a preset, newest first. */
export function listVersions(db: Executor, presetId: string) {
  return db
    .select()
    .from(presetVersions)
    .where(eq(presetVersions.presetId, presetId))
    .orderBy(desc(presetVersions.version));
}

/** One version of a preset, or null; a number no integer column holds (a version from a URL) names none. */
export async function findVersion(db: Executor, presetId: string, version: number) {
  if (!Number.isSafeInteger(version) || version < 1 || version > MAX_VERSION) return null;
  const [row] = await db
    .select()
    .from(presetVersions)
    .where(and(eq(presetVersions.presetId, presetId), eq(presetVersions.version, version)));
  return row ?? null;
}

export type VersionRow = NonNullable<Awaited<ReturnType<typeof findVersion>>>;
