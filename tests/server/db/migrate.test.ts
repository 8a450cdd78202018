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

  it('creates every table on an empty database, and seeding twice keeps one demo studio and its three people', async () => {
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
      expect(tables.rows.map((r) => r.table_name)).toEqual(
        expect.arrayContaining(['users', 'sessions', 'teams', 'team_members', 'invitations', 'audit_events']),
      );
      await seedDemoData(db);
      await seedDemoData(db);
      const studios = await db.execute(sql`select id from teams where name = 'Quillmoss Prop Studio'`);
      expect(studios.rows).toHaveLength(1);
      const roles = await db.execute(
        sql`select role::text as role from team_members where team_id = ${studios.rows[0]?.id} order by role::text`,
      );
      expect(roles.rows.map((r) => r.role)).toEqual(['editor', 'owner', 'viewer']);
      const people = await db.execute(sql`select count(*)::int as n from users where email like '%@quillmoss.example'`);
      expect(people.rows[0]?.n).toBe(3);
    } finally {
      await pool.end();
    }
  });
});
