import { and, arrayContains, asc, count, desc, eq, ilike, or, sql, type SQL } from 'drizzle-orm';
import { alias } from 'drizzle-orm/pg-core';
import type { Executor } from '../../db/executor';
import { presets, printerProfiles, users } from '../../db/schema';
import type { ParsedPresetListQuery } from '../../../shared/schemas/preset';
import { containsPattern, offsetOf } from './library-query';

const creator = alias(users, 'creator');
const updater = alias(users, 'updater');

const columns = {
  id: presets.id,
  teamId: presets.teamId,
  name: presets.name,
  description: presets.description,
  tags: presets.tags,
  printerProfileId: presets.printerProfileId,
  printerProfileName: printerProfiles.name,
  version: presets.version,
  schemaVersion: presets.schemaVersion,
  settings: presets.settings,
  archived: presets.archived,
  createdAt: presets.createdAt,
  createdById: presets.createdBy,
  createdByName: creator.name,
  updatedAt: presets.updatedAt,
  updatedById: presets.updatedBy,
  updatedByName: updater.name,
};

const select = (db: Executor) =>
  db
    .select(columns)
    .from(presets)
    .leftJoin(printerProfiles, eq(printerProfiles.id, presets.printerProfileId))
    .leftJoin(creator, eq(creator.id, presets.createdBy))
    .leftJoin(updater, eq(updater.id, presets.updatedBy));

/** A preset row with the names of its printer profile, creator and last editor. */
export type PresetRow = Awaited<ReturnType<ReturnType<typeof select>['execute']>>[number];

/** The fields every version stores in full. */
export interface PresetFields {
  name: string;
  description: string;
  tags: string[];
  printerProfileId: string | null;
  schemaVersion: number;
  settings: Record<string, unknown>;
}

// Only the stored fields, whatever else the caller's object carries.
const columnsOf = (f: PresetFields): PresetFields => ({
  name: f.name,
  description: f.description,
  tags: f.tags,
  printerProfileId: f.printerProfileId,
  schemaVersion: f.schemaVersion,
  settings: f.settings,
});

export async function findPreset(db: Executor, teamId: string, id: string): Promise<PresetRow | null> {
  const [row] = await select(db).where(and(eq(presets.teamId, teamId), eq(presets.id, id)));
  return row ?? null;
}

/** Locks the preset row until the transaction ends, so two saves of one preset queue up. */
export async function lockPreset(db: Executor, teamId: string, id: string): Promise<boolean> {
  const rows = await db
    .select({ id: presets.id })
    .from(presets)
    .where(and(eq(presets.teamId, teamId), eq(presets.id, id)))
    .for('update');
  return rows.length > 0;
}

const jsonField = (field: string) => sql`${presets.settings}->>${field}`;

function filters(teamId: string, q: ParsedPresetListQuery): SQL | undefined {
  const conditions: (SQL | undefined)[] = [eq(presets.teamId, teamId)];
  if (q.q) {
    const p = containsPattern(q.q);
    conditions.push(
      or(ilike(presets.name, p), ilike(presets.description, p), sql`array_to_string(${presets.tags}, ' ') ilike ${p}`),
    );
  }
  if (q.tag) conditions.push(arrayContains(presets.tags, [q.tag.toLowerCase()]));
  if (q.joint) conditions.push(sql`${jsonField('joint')} = ${q.joint}`);
  if (q.material) conditions.push(sql`${jsonField('material')} = ${q.material}`);
  if (q.printer) conditions.push(eq(presets.printerProfileId, q.printer));
  if (q.author) conditions.push(eq(presets.createdBy, q.author));
  if (q.archived !== 'all') conditions.push(eq(presets.archived, q.archived === 'archived'));
  return and(...conditions);
}

/** One page of the team's presets matching the query, and how many match in all. */
export async function listPresets(db: Executor, teamId: string, q: ParsedPresetListQuery) {
  const where = filters(teamId, q);
  const direction = q.order === 'asc' ? asc : desc;
  const sortColumn = q.sort === 'name' ? sql`lower(${presets.name})` : presets[q.sort];
  const rows = await select(db)
    .where(where)
    .orderBy(direction(sortColumn), asc(presets.id))
    .limit(q.pageSize)
    .offset(offsetOf(q.page, q.pageSize));
  const [total] = await db.select({ n: count() }).from(presets).where(where);
  return { rows, total: total?.n ?? 0 };
}

/** Every preset of the team, oldest first (for the export file). */
export function allPresets(db: Executor, teamId: string): Promise<PresetRow[]> {
  return select(db).where(eq(presets.teamId, teamId)).orderBy(asc(presets.createdAt), asc(presets.id));
}

/** The names the team's presets use, lower-cased (for clash checks on import). */
export async function presetNames(db: Executor, teamId: string): Promise<Set<string>> {
  const rows = await db.select({ name: presets.name }).from(presets).where(eq(presets.teamId, teamId));
  return new Set(rows.map((r) => r.name.toLowerCase()));
}

export async function insertPreset(
  db: Executor,
  teamId: string,
  userId: string,
  fields: PresetFields,
): Promise<string> {
  const [row] = await db
    .insert(presets)
    .values({ teamId, ...columnsOf(fields), version: 1, createdBy: userId, updatedBy: userId })
    .returning({ id: presets.id });
  if (!row) throw new Error('insert into presets returned nothing');
  return row.id;
}

/** Writes the new current state and bumps the version; the caller holds the row lock. */
export async function updatePreset(db: Executor, id: string, userId: string, version: number, fields: PresetFields) {
  await db
    .update(presets)
    .set({ ...columnsOf(fields), version, updatedBy: userId, updatedAt: new Date() })
    .where(eq(presets.id, id));
}

export async function setArchived(db: Executor, teamId: string, id: string, archived: boolean): Promise<boolean> {
  const rows = await db
    .update(presets)
    .set({ archived })
    .where(and(eq(presets.teamId, teamId), eq(presets.id, id)))
    .returning({ id: presets.id });
  return rows.length > 0;
}

export async function deletePreset(db: Executor, teamId: string, id: string): Promise<boolean> {
  const rows = await db
    .delete(presets)
    .where(and(eq(presets.teamId, teamId), eq(presets.id, id)))
    .returning({ id: presets.id });
  return rows.length > 0;
}
