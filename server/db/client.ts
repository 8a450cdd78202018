import pg from 'pg';
import { drizzle, type NodePgDatabase } from 'drizzle-orm/node-postgres';
import * as schema from './schema';

export type Database = NodePgDatabase<typeof schema>;

/** Opens a connection pool and the Drizzle handle over it; close the pool on shutdown. */
export function createDatabase(url: string): { db: Database; pool: pg.Pool } {
  const pool = new pg.Pool({ connectionString: url, max: 10, connectionTimeoutMillis: 5_000 });
  // An idle client losing its connection must not crash the process; the next query reconnects.
  pool.on('error', () => {});
  return { db: drizzle(pool, { schema, casing: 'snake_case' }), pool };
}
