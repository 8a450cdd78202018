import type { Database } from '../client';
import { studios } from '../schema';
import { demoStudio } from './demo-scenario';

/** Inserts the demo scenario; running it again changes nothing (idempotent by natural keys). */
export async function seedDemoData(db: Database): Promise<void> {
  await db.insert(studios).values(demoStudio).onConflictDoNothing({ target: studios.slug });
}
