import { and, desc, eq } from 'drizzle-orm';
import type { Executor } from '../../db/executor';
import { fitTests, printerProfiles, users } from '../../db/schema';
import type { CalibrationEntry } from '../../../shared/schemas/printer-profile';
import type { FitTestAnswer } from '../../../shared/schemas/fit-test-answer';
import type { FitTestBest, FitTestCoupon } from '../../../shared/schemas/fit-test';
import type { Material } from '../../../shared/schemas/joint-options';
import type { Person } from '../../../shared/schemas/library-fields';
import { personOf } from '../presets/library-query';

/** A stored fit test, before the service adds the offsets against today's published defaults. */
export interface StoredFitTest {
  id: string;
  printerProfileId: string;
  material: Material;
  joint: 'key' | 'dovetail';
  coupon: FitTestCoupon;
  answers: FitTestAnswer[];
  best: FitTestBest;
  notes: string[];
  createdBy: Person;
  createdAt: Date;
}

const select = (db: Executor) =>
  db
    .select({
      id: fitTests.id,
      printerProfileId: fitTests.printerProfileId,
      material: fitTests.material,
      joint: fitTests.joint,
      coupon: fitTests.coupon,
      answers: fitTests.answers,
      best: fitTests.best,
      notes: fitTests.notes,
      createdById: fitTests.createdBy,
      createdByName: users.name,
      createdAt: fitTests.createdAt,
    })
    .from(fitTests)
    .leftJoin(users, eq(users.id, fitTests.createdBy));
type Row = Awaited<ReturnType<ReturnType<typeof select>['execute']>>[number];

function toStored({ createdById, createdByName, ...r }: Row): StoredFitTest {
  return { ...r, createdBy: personOf(createdById, createdByName) };
}

/** Every fit test of one profile of one team, newest first (a profile keeps a handful, not thousands). */
export async function listFitTests(db: Executor, teamId: string, profileId: string): Promise<StoredFitTest[]> {
  const rows = await select(db)
    .where(and(eq(fitTests.teamId, teamId), eq(fitTests.printerProfileId, profileId)))
    .orderBy(desc(fitTests.createdAt), desc(fitTests.id));
  return rows.map(toStored);
}

export async function findFitTest(
  db: Executor,
  teamId: string,
  profileId: string,
  id: string,
): Promise<StoredFitTest | null> {
  const [row] = await select(db).where(
    and(eq(fitTests.teamId, teamId), eq(fitTests.printerProfileId, profileId), eq(fitTests.id, id)),
  );
  return row ? toStored(row) : null;
}

export interface NewFitTest {
  teamId: string;
  printerProfileId: string;
  material: Material;
  joint: 'key' | 'dovetail';
  coupon: FitTestCoupon;
  answers: FitTestAnswer[];
  best: FitTestBest;
  notes: string[];
  createdBy: string;
}

export async function insertFitTest(db: Executor, test: NewFitTest): Promise<string> {
  const [row] = await db.insert(fitTests).values(test).returning({ id: fitTests.id });
  if (!row) throw new Error('insert into fit_tests returned nothing');
  return row.id;
}

/**
 * Locks the profile row for the rest of the transaction, so two tests recorded at once cannot each read
 * the old calibration and lose the other's entries. Returns false when the team has no such profile.
 */
export async function lockProfile(db: Executor, teamId: string, profileId: string): Promise<boolean> {
  const rows = await db
    .select({ id: printerProfiles.id })
    .from(printerProfiles)
    .where(and(eq(printerProfiles.teamId, teamId), eq(printerProfiles.id, profileId)))
    .for('update');
  return rows.length > 0;
}

/** Replaces the profile's calibration table and marks who changed it. */
export async function setCalibration(
  db: Executor,
  teamId: string,
  profileId: string,
  userId: string,
  calibration: CalibrationEntry[],
): Promise<void> {
  await db
    .update(printerProfiles)
    .set({ calibration, updatedBy: userId, updatedAt: new Date() })
    .where(and(eq(printerProfiles.teamId, teamId), eq(printerProfiles.id, profileId)));
}
