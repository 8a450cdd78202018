// Database commands behind `npm run db:*`; scripts/db.mjs starts PostgreSQL and sets DATABASE_URL.
import { sql } from 'drizzle-orm';
import { createDatabase } from './client';
import { migrateDatabase } from './migrate';
import { seedDemoData } from './seed/seed-demo-data';

const url = process.env.DATABASE_URL;
if (!url) throw new Error('DATABASE_URL is required');
const { db, pool } = createDatabase(url);

const commands: Record<string, () => Promise<void>> = {
  migrate: () => migrateDatabase(db),
  seed: () => seedDemoData(db),
  // Drops every table and the migration journal, then rebuilds; scripts/db.mjs asks first.
  reset: async () => {
    await db.execute(sql`drop schema if exists public cascade`);
    await db.execute(sql`drop schema if exists drizzle cascade`);
    await db.execute(sql`create schema public`);
    await migrateDatabase(db);
    await seedDemoData(db);
  },
};

const name = process.argv[2] ?? '';
const command = commands[name];
if (!command) {
  process.stderr.write(`unknown database command "${name}"; use one of ${Object.keys(commands).join(', ')}\n`);
  process.exit(2);
}
try {
  await command();
} finally {
  await pool.end();
}
