// Runs once before the suite: applies the migrations to the fresh test database that
// scripts/test.mjs created. Pure unit tests run without a database (DATABASE_URL unset).
import { createDatabase } from '../../server/db/client';
import { migrateDatabase } from '../../server/db/migrate';

export default async function setup(): Promise<void> {
  const url = process.env.DATABASE_URL;
  if (!url) return;
  const { db, pool } = createDatabase(url);
  try {
    await migrateDatabase(db);
  } finally {
    await pool.end();
  }
}
