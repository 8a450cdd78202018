import { and, asc, count, desc, eq, ilike, or, sql, type SQL } from 'drizzle-orm';
import type { Executor } from '../../db/executor';
import { kitDownloads } from '../../db/schema';
import type { z } from 'zod';
import type { KitHistoryItem, kitHistoryQuerySchema } from '../../../shared/schemas/kit-history';
import { containsPattern, offsetOf, personOf } from '../presets/library-query';

export type NewKitDownload = typeof kitDownloads.$inferInsert;
type KitHistoryFilter = z.output<typeof kitHistoryQuerySchema>;

// Everything but the request, the hashes and the zip: what a list row needs.
const itemColumns = {
  id: kitDownloads.id,
  createdAt: kitDownloads.createdAt,
  userId: kitDownloads.userId,
  userName: kitDownloads.userName,
  presetId: kitDownloads.presetId,
  presetName: kitDownloads.presetName,
  presetVersion: kitDownloads.presetVersion,
  printerProfileId: kitDownloads.printerProfileId,
  printerProfileName: kitDownloads.printerProfileName,
  calibration: kitDownloads.calibration,
  fileName: kitDownloads.fileName,
  engineVersion: kitDownloads.engineVersion,
  summary: kitDownloads.summary,
};
const selectItems = (db: Executor) => db.select(itemColumns).from(kitDownloads);
type ItemRow = Awaited<ReturnType<ReturnType<typeof selectItems>['execute']>>[number];

export function toItem({ userId, userName, createdAt, calibration, ...r }: ItemRow): KitHistoryItem {
  return {
    ...r,
    createdAt: createdAt.toISOString(),
    user: personOf(userId, userName),
    calibration: calibration ?? null,
  };
}

export async function insertKitDownload(db: Executor, values: NewKitDownload): Promise<string> {
  const [row] = await db.insert(kitDownloads).values(values).returning({ id: kitDownloads.id });
  if (!row) throw new Error('insert into kit_downloads returned nothing');
  return row.id;
}

/** The whole entry but the zip (request, hashes, summary). */
export async function findKitDownload(db: Executor, teamId: string, id: string) {
  const [row] = await db
    .select({ ...itemColumns, request: kitDownloads.request, files: kitDownloads.files })
    .from(kitDownloads)
    .where(and(eq(kitDownloads.teamId, teamId), eq(kitDownloads.id, id)));
  return row ?? null;
}

/** The original zip as it was downloaded. */
export async function findKitZip(db: Executor, teamId: string, id: string): Promise<Buffer | null> {
  const [row] = await db
    .select({ zip: kitDownloads.zip })
    .from(kitDownloads)
    .where(and(eq(kitDownloads.teamId, teamId), eq(kitDownloads.id, id)));
  return row?.zip ?? null;
}

const requestField = (field: string) => sql`${kitDownloads.request}->>${field}`;

/** One page of the team's kit history, newest first unless asked otherwise. */
export async function listKitDownloads(db: Executor, teamId: string, f: KitHistoryFilter) {
  const conditions: (SQL | undefined)[] = [eq(kitDownloads.teamId, teamId)];
  if (f.q) {
    const p = containsPattern(f.q);
    conditions.push(
      or(
        ilike(kitDownloads.fileName, p),
        ilike(kitDownloads.presetName, p),
        ilike(kitDownloads.printerProfileName, p),
        ilike(kitDownloads.userName, p),
      ),
    );
  }
  if (f.joint) conditions.push(sql`${requestField('joint')} = ${f.joint}`);
  if (f.material) conditions.push(sql`${requestField('material')} = ${f.material}`);
  if (f.printer) conditions.push(eq(kitDownloads.printerProfileId, f.printer));
  if (f.preset) conditions.push(eq(kitDownloads.presetId, f.preset));
  if (f.author) conditions.push(eq(kitDownloads.userId, f.author));
  const where = and(...conditions);
  const direction = f.order === 'asc' ? asc : desc;
  const rows = await selectItems(db)
    .where(where)
    .orderBy(direction(kitDownloads[f.sort]), asc(kitDownloads.id))
    .limit(f.pageSize)
    .offset(offsetOf(f.page, f.pageSize));
  const [total] = await db.select({ n: count() }).from(kitDownloads).where(where);
  return { items: rows.map(toItem), total: total?.n ?? 0 };
}
