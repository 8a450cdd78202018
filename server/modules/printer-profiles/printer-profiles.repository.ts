import { and, asc, count, desc, eq, ilike, or, sql, type SQL } from 'drizzle-orm';
import type { Executor } from '../../db/executor';
import { printerProfiles, users } from '../../db/schema';
import type { ParsedPrinterProfileInput, PrinterProfile } from '../../../shared/schemas/printer-profile';
import { containsPattern, offsetOf, personOf } from '../presets/library-query';

const columns = {
  id: printerProfiles.id,
  name: printerProfiles.name,
  process: printerProfiles.process,
  buildX: printerProfiles.buildX,
  buildY: printerProfiles.buildY,
  buildZ: printerProfiles.buildZ,
  nozzleDiameter: printerProfiles.nozzleDiameter,
  layerHeight: printerProfiles.layerHeight,
  notes: printerProfiles.notes,
  calibration: printerProfiles.calibration,
  createdAt: printerProfiles.createdAt,
  updatedAt: printerProfiles.updatedAt,
  updatedById: printerProfiles.updatedBy,
  updatedByName: users.name,
};

const select = (db: Executor) =>
  db.select(columns).from(printerProfiles).leftJoin(users, eq(users.id, printerProfiles.updatedBy));
type Row = Awaited<ReturnType<ReturnType<typeof select>['execute']>>[number];

function toProfile(r: Row): PrinterProfile {
  return {
    id: r.id,
    name: r.name,
    process: r.process,
    buildVolume: { x: r.buildX, y: r.buildY, z: r.buildZ },
    nozzleDiameter: r.nozzleDiameter,
    layerHeight: r.layerHeight,
    notes: r.notes,
    calibration: r.calibration,
    createdAt: r.createdAt.toISOString(),
    updatedAt: r.updatedAt.toISOString(),
    updatedBy: personOf(r.updatedById, r.updatedByName),
  };
}

/** The columns of a profile from a parsed input. */
export function profileValues(p: ParsedPrinterProfileInput) {
  return {
    name: p.name,
    process: p.process,
    buildX: p.buildVolume.x,
    buildY: p.buildVolume.y,
    buildZ: p.buildVolume.z,
    nozzleDiameter: p.nozzleDiameter,
    layerHeight: p.layerHeight,
    notes: p.notes,
    calibration: p.calibration,
  };
}

export async function findProfile(db: Executor, teamId: string, id: string): Promise<PrinterProfile | null> {
  const [row] = await select(db).where(and(eq(printerProfiles.teamId, teamId), eq(printerProfiles.id, id)));
  return row ? toProfile(row) : null;
}

/** The profile of this team with this name (compared without case), or null. */
export async function findProfileByName(db: Executor, teamId: string, name: string): Promise<PrinterProfile | null> {
  const [row] = await select(db).where(
    and(eq(printerProfiles.teamId, teamId), sql`lower(${printerProfiles.name}) = lower(${name})`),
  );
  return row ? toProfile(row) : null;
}

export interface ProfileListFilter {
  q?: string;
  process?: 'fdm' | 'resin';
  sort: 'name' | 'updatedAt' | 'createdAt';
  order: 'asc' | 'desc';
  page: number;
  pageSize: number;
}

export async function listProfiles(db: Executor, teamId: string, f: ProfileListFilter) {
  const conditions: (SQL | undefined)[] = [eq(printerProfiles.teamId, teamId)];
  if (f.q) {
    const p = containsPattern(f.q);
    conditions.push(or(ilike(printerProfiles.name, p), ilike(printerProfiles.notes, p)));
  }
  if (f.process) conditions.push(eq(printerProfiles.process, f.process));
  const where = and(...conditions);
  const direction = f.order === 'asc' ? asc : desc;
  const rows = await select(db)
    .where(where)
    .orderBy(direction(printerProfiles[f.sort]), asc(printerProfiles.id))
    .limit(f.pageSize)
    .offset(offsetOf(f.page, f.pageSize));
  const [total] = await db.select({ n: count() }).from(printerProfiles).where(where);
  return { items: rows.map(toProfile), total: total?.n ?? 0 };
}

export async function insertProfile(db: Executor, teamId: string, userId: string, p: ParsedPrinterProfileInput) {
  const [row] = await db
    .insert(printerProfiles)
    .values({ teamId, updatedBy: userId, ...profileValues(p) })
    .returning({ id: printerProfiles.id });
  if (!row) throw new Error('insert into printer_profiles returned nothing');
  return row.id;
}

export async function updateProfile(
  db: Executor,
  teamId: string,
  id: string,
  userId: string,
  p: ParsedPrinterProfileInput,
) {
  await db
    .update(printerProfiles)
    .set({ ...profileValues(p), updatedBy: userId, updatedAt: new Date() })
    .where(and(eq(printerProfiles.teamId, teamId), eq(printerProfiles.id, id)));
}

export async function deleteProfile(db: Executor, teamId: string, id: string): Promise<boolean> {
  const rows = await db
    .delete(printerProfiles)
    .where(and(eq(printerProfiles.teamId, teamId), eq(printerProfiles.id, id)))
    .returning({ id: printerProfiles.id });
  return rows.length > 0;
}
