import type { Database } from './client';

/** The database or an open transaction: repositories accept either, services decide which. */
export type Executor = Database | Parameters<Parameters<Database['transaction']>[0]>[0];
