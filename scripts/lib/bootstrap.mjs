// The shared first half of `npm start` and `npm test`: dependencies, then a running database.
import { ensureDependencies } from './ensure-deps.mjs';
import { databaseUrl } from './db-settings.mjs';
import { ensureDatabase, ensureServerBinaries, startCluster } from './postgres.mjs';

/** Makes sure node_modules and the local cluster are ready and the database exists; returns its URL. */
export async function bootstrap(database, { fresh = false } = {}) {
  ensureDependencies();
  const bin = ensureServerBinaries();
  await startCluster(bin);
  ensureDatabase(bin, database, { fresh });
  return databaseUrl(database);
}
