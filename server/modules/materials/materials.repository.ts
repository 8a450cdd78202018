import { and, asc, count, desc, eq, ilike, or, type SQL } from 'drizzle-orm';
import type { Executor } from '../../db/executor';
import { teamMaterials, users } from '../../db/schema';
import { defaultProcessFor } from '../../../shared/fit/default-process-for';
import type { ParsedTeamMaterialInput, TeamMaterial } from '../../../shared/schemas/material';
import type { Material } from '../../../shared/schemas/joint-options';
import { containsPattern, offsetOf, personOf } from '../presets/library-query';

const columns = {
  id: teamMaterials.id,
  name: teamMaterials.name,
  baseMaterial: teamMaterials.baseMaterial,
  shrinkagePercent: teamMaterials.shrinkagePercent,
  clearanceAdjustments: teamMaterials.clearanceAdjustments,
  notes: teamMaterials.notes,
  createdAt: teamMaterials.createdAt,
  updatedAt: teamMaterials.updatedAt,
  updatedById: teamMaterials.updatedBy,
  updatedByName: users.name,
};
const select = (db: Executor) =>
  db.select(columns).from(teamMaterials).leftJoin(users, eq(users.id, teamMaterials.updatedBy));
type Row = Awaited<ReturnType<ReturnType<typeof select>['execute']>>[number];

function toMaterial(r: Row): TeamMaterial {
  return {
    id: r.id,
    name: r.name,
    baseMaterial: r.baseMaterial,
    process: defaultProcessFor(r.baseMaterial),
    shrinkagePercent: r.shrinkagePercent,
    clearanceAdjustments: r.clearanceAdjustments,
    notes: r.notes,
    createdAt: r.createdAt.toISOString(),
    updatedAt: r.updatedAt.toISOString(),
    updatedBy: personOf(r.updatedById, r.updatedByName),
  };
}

export async function findMaterial(db: Executor, teamId: string, id: string): Promise<TeamMaterial | null> {
  const [row] = await select(db).where(and(eq(teamMaterials.teamId, teamId), eq(teamMaterials.id, id)));
  return row ? toMaterial(row) : null;
}

export interface MaterialListFilter {
  q?: string;
  base?: Material;
  sort: 'name' | 'updatedAt' | 'createdAt';
  order: 'asc' | 'desc';
  page: number;
  pageSize: number;
}

export async function listMaterials(db: Executor, teamId: string, f: MaterialListFilter) {
  const conditions: (SQL | undefined)[] = [eq(teamMaterials.teamId, teamId)];
  if (f.q) {
    const p = containsPattern(f.q);
    conditions.push(or(ilike(teamMaterials.name, p), ilike(teamMaterials.notes, p)));
  }
  if (f.base) conditions.push(eq(teamMaterials.baseMaterial, f.base));
  const where = and(...conditions);
  const direction = f.order === 'asc' ? asc : desc;
  const rows = await select(db)
    .where(where)
    .orderBy(direction(teamMaterials[f.sort]), asc(teamMaterials.id))
    .limit(f.pageSize)
    .offset(offsetOf(f.page, f.pageSize));
  const [total] = await db.select({ n: count() }).from(teamMaterials).where(where);
  return { items: rows.map(toMaterial), total: total?.n ?? 0 };
}

export async function insertMaterial(db: Executor, teamId: string, userId: string, m: ParsedTeamMaterialInput) {
  const [row] = await db
    .insert(teamMaterials)
    .values({ teamId, updatedBy: userId, ...m })
    .returning({ id: teamMaterials.id });
  if (!row) throw new Error('insert into team_materials returned nothing');
  return row.id;
}

export async function updateMaterial(
  db: Executor,
  teamId: string,
  id: string,
  userId: string,
  m: ParsedTeamMaterialInput,
) {
  await db
    .update(teamMaterials)
    .set({ ...m, updatedBy: userId, updatedAt: new Date() })
    .where(and(eq(teamMaterials.teamId, teamId), eq(teamMaterials.id, id)));
}

export async function deleteMaterial(db: Executor, teamId: string, id: string): Promise<boolean> {
  const rows = await db
    .delete(teamMaterials)
    .where(and(eq(teamMaterials.teamId, teamId), eq(teamMaterials.id, id)))
    .returning({ id: teamMaterials.id });
  return rows.length > 0;
}
