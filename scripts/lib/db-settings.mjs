// The project-local PostgreSQL cluster: where it lives, which port, which databases.

export const dbPort = Number(process.env.SEAMWRIGHT_DB_PORT ?? 5544);
export const appDatabase = 'seamwright';
// Parallel runs on one machine (several contributors' checkouts) can each take their own test database.
export const testDatabase = process.env.SEAMWRIGHT_TEST_DB ?? 'seamwright_test';

/** A connection URL for one database of the local cluster (trust auth, loopback only). */
export const databaseUrl = (name) => `postgres://postgres@127.0.0.1:${dbPort}/${name}`;
