import { spawnSync } from 'node:child_process';
import { randomBytes } from 'node:crypto';
import { mkdtempSync, readFileSync, rmSync, statSync, writeFileSync } from 'node:fs';
import os from 'node:os';
import path from 'node:path';
import pg from 'pg';
import { eq, sql } from 'drizzle-orm';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { createDatabase } from '../../server/db/client';
import { migrateDatabase } from '../../server/db/migrate';
import { presets, presetVersions, teamMembers, teams, users } from '../../server/db/schema';
import { PRESET_SETTINGS_VERSION } from '../../shared/schemas/preset-settings-upgrades';
import { repoRoot, scriptEnv } from './script-env';

// `npm run db:backup` / `db:restore` as a person runs them (node scripts/db.mjs …), against a database of
// this test's own in the running test cluster, so neither the app's nor the suite's database is touched.
const adminUrl = process.env.SEAMWRIGHT_DB_ADMIN_URL ?? '';
const name = `sw_backup_${randomBytes(4).toString('hex')}`;
const copyName = `${name}_copy`;
const folder = mkdtempSync(path.join(os.tmpdir(), 'sw-backup-'));
const backupFile = path.join(folder, 'library.dump');

const urlOf = (database: string) => {
  const url = new URL(adminUrl);
  url.pathname = `/${database}`;
  return url.toString();
};

function dbScript(...args: string[]) {
  const r = spawnSync(process.execPath, ['scripts/db.mjs', ...args], {
    cwd: repoRoot,
    env: scriptEnv({ SEAMWRIGHT_DB_PORT: new URL(adminUrl).port }),
    stdio: ['ignore', 'pipe', 'pipe'],
    encoding: 'utf8',
    timeout: 60_000,
  });
  return { status: r.status, stderr: r.stderr };
}

/** Opens the database, runs `use`, closes it again (a restore closes every open connection). */
async function withDb<T>(database: string, use: (db: ReturnType<typeof createDatabase>['db']) => Promise<T>) {
  const { db, pool } = createDatabase(urlOf(database));
  try {
    return await use(db);
  } finally {
    await pool.end();
  }
}

const settings = {
  joint: 'key',
  material: 'PLA',
  fit: 'snug',
  key: { shape: 'square', width: 10, depth: 8, count: 6 },
};

/** The preset with both its versions, as stored. */
const readPreset = (database: string, id: string) =>
  withDb(database, async (db) => ({
    preset: (await db.select().from(presets).where(eq(presets.id, id)))[0],
    versions: await db
      .select({ version: presetVersions.version, name: presetVersions.name })
      .from(presetVersions)
      .where(eq(presetVersions.presetId, id))
      .orderBy(presetVersions.version),
  }));

const listDatabases = async (admin: pg.Client) =>
  (await admin.query<{ datname: string }>(`SELECT datname FROM pg_database WHERE datname LIKE '${name}%'`)).rows
    .map((r) => r.datname)
    .sort();

describe('db:backup and db:restore', () => {
  const admin = new pg.Client({ connectionString: adminUrl });
  let presetId = '';

  beforeAll(async () => {
    await admin.connect();
    await admin.query(`CREATE DATABASE ${name}`);
    presetId = await withDb(name, async (db) => {
      await migrateDatabase(db);
      const [user] = await db
        .insert(users)
        .values({ email: `${name}@example.test`, name: 'Backup Owner', passwordHash: 'not-a-real-hash' })
        .returning();
      const [team] = await db.insert(teams).values({ name: 'Backup Studio' }).returning();
      await db.insert(teamMembers).values({ teamId: team!.id, userId: user!.id, role: 'owner' });
      const base = { teamId: team!.id, schemaVersion: PRESET_SETTINGS_VERSION, settings, createdBy: user!.id };
      const [preset] = await db
        .insert(presets)
        .values({ ...base, name: 'Helmet seam v2', version: 2, updatedBy: user!.id })
        .returning();
      const version = { presetId: preset!.id, description: '', tags: [], schemaVersion: PRESET_SETTINGS_VERSION };
      await db.insert(presetVersions).values([
        { ...version, version: 1, name: 'Helmet seam', settings, changes: ['created'], authorId: user!.id },
        { ...version, version: 2, name: 'Helmet seam v2', settings, changes: ['renamed'], authorId: user!.id },
      ]);
      // Ballast, so that a backup cut in half keeps its table of contents and loses table data.
      await db.execute(sql`CREATE TABLE ballast AS SELECT g, md5(g::text) AS h FROM generate_series(1, 20000) g`);
      return preset!.id;
    });
  });

  afterAll(async () => {
    for (const database of [name, copyName, `${name}_restoring`, `${name}_replaced`])
      await admin.query(`DROP DATABASE IF EXISTS ${database} WITH (FORCE)`);
    await admin.end();
    rmSync(folder, { recursive: true, force: true });
  });

  it('brings back a preset and its versions deleted after the backup, when the restore is confirmed', async () => {
    const backup = dbScript('backup', backupFile, '--database', name);
    expect(backup.stderr).toContain(`backed up the "${name}" database to ${backupFile}`);
    expect(backup.status).toBe(0);
    expect(readFileSync(backupFile).subarray(0, 5).toString()).toBe('PGDMP'); // pg_dump's custom format
    expect(statSync(backupFile).mode & 0o777).toBe(0o600); // it holds password hashes

    await withDb(name, (db) => db.delete(presets).where(eq(presets.id, presetId)));
    expect((await readPreset(name, presetId)).preset).toBeUndefined();

    const restore = dbScript('restore', backupFile, '--yes', '--database', name);
    expect(restore.stderr).toContain(`restored the "${name}" database from ${backupFile}`);
    expect(restore.status).toBe(0);
    const back = await readPreset(name, presetId);
    expect(back.preset).toMatchObject({ name: 'Helmet seam v2', version: 2, settings });
    expect(back.versions).toEqual([
      { version: 1, name: 'Helmet seam' },
      { version: 2, name: 'Helmet seam v2' },
    ]);
    // Nothing of the swap stays behind.
    expect(await listDatabases(admin)).toEqual([name]);
  });

  it('creates the database when the restore names one that does not exist', async () => {
    const restore = dbScript('restore', backupFile, '--yes', '--database', copyName);
    expect(restore.status).toBe(0);
    expect((await readPreset(copyName, presetId)).versions).toHaveLength(2);
  });

  it('refuses to restore without --yes when nobody can answer the question, and changes nothing', async () => {
    await withDb(name, (db) =>
      db.update(presets).set({ name: 'Renamed after backup' }).where(eq(presets.id, presetId)),
    );
    const restore = dbScript('restore', backupFile, '--database', name);
    expect(restore.status).toBe(1);
    expect(restore.stderr).toContain('--yes');
    expect((await readPreset(name, presetId)).preset?.name).toBe('Renamed after backup');
  });

  it('fails with exit 1 on a missing file, a garbage file or a plain SQL file, and changes nothing', async () => {
    const garbage = path.join(folder, 'garbage.dump');
    writeFileSync(garbage, randomBytes(4096));
    const plainSql = path.join(folder, 'plain.sql');
    writeFileSync(plainSql, 'DROP TABLE presets;\n');
    for (const [file, message] of [
      [path.join(folder, 'missing.dump'), 'does not exist'],
      [garbage, 'is not a backup made by db:backup'],
      [plainSql, 'is not a backup made by db:backup'],
    ] as const) {
      const restore = dbScript('restore', file, '--yes', '--database', name);
      expect(restore.status).toBe(1);
      expect(restore.stderr).toContain(message);
      expect(restore.stderr).toContain('nothing was changed');
    }
    expect((await readPreset(name, presetId)).versions).toHaveLength(2);
    expect(await listDatabases(admin)).toEqual([name, copyName].sort());
  });

  it('keeps the current data when a damaged backup fails half-way through the restore', async () => {
    const cut = path.join(folder, 'cut.dump');
    const whole = readFileSync(backupFile);
    writeFileSync(cut, whole.subarray(0, Math.floor(whole.length / 2)));
    const restore = dbScript('restore', cut, '--yes', '--database', name);
    expect(restore.status).toBe(1);
    expect(restore.stderr).toContain(`the restore failed, so "${name}" was left as it was`);
    expect((await readPreset(name, presetId)).preset?.name).toBe('Renamed after backup');
    expect(await listDatabases(admin)).toEqual([name, copyName].sort());
  });

  it('refuses to back up a database that does not exist', () => {
    const backup = dbScript('backup', path.join(folder, 'none.dump'), '--database', `${name}_none`);
    expect(backup.status).toBe(1);
    expect(backup.stderr).toContain('there is no database');
  });
});
