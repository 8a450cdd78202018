import { randomBytes } from 'node:crypto';
import { afterAll, describe, expect, it } from 'vitest';
import pg from 'pg';
import { sql } from 'drizzle-orm';
import { createDatabase } from '../../../server/db/client';
import { migrateDatabase } from '../../../server/db/migrate';
import { seedDemoData } from '../../../server/db/seed/seed-demo-data';

// Works on a throwaway database so the shared test database is untouched.
const adminUrl = process.env.SEAMWRIGHT_DB_ADMIN_URL;
const name = `seamwright_migrate_${randomBytes(4).toString('hex')}`;

describe('migrateDatabase', () => {
  const admin = new pg.Client({ connectionString: adminUrl });
  afterAll(async () => {
    await admin.query(`DROP DATABASE IF EXISTS ${name} WITH (FORCE)`);
    await admin.end();
  });

  it('creates every table on an empty database, and seeding twice keeps one demo studio', async () => {
    await admin.connect();
    await admin.query(`CREATE DATABASE ${name}`);
    const url = new URL(adminUrl ?? '');
    url.pathname = `/${name}`;
    const { db, pool } = createDatabase(url.toString());
    try {
      await migrateDatabase(db);
      await migrateDatabase(db); // a second run finds nothing to do
      const tables = await db.execute(
        sql`select table_name from information_schema.tables where table_schema = 'public'`,
      );
      expect(tables.rows.map((r) => r.table_name)).toContain('studios');
      await seedDemoData(db);
      await seedDemoData(db);
      const count = await db.execute(sql`select count(*)::int as n from studios`);
      expect(count.rows[0]?.n).toBe(1);
    } finally {
      await pool.end();
    }
  });
});
