import { sql } from 'drizzle-orm';
import type { Database } from '../../db/client';

/** Asks the database a trivial question; rejects when it cannot answer. */
export async function pingDatabase(db: Database): Promise<void> {
  await db.execute(sql`select 1`);
}
