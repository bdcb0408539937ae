import { Kysely, PostgresDialect } from 'kysely';
import pg from 'pg';

import type { Database } from './schema';

export type Db = Kysely<Database>;

export function createDb(connectionString: string, max = 10): Db {
  const pool = new pg.Pool({ connectionString, max, connectionTimeoutMillis: 5_000 });
  // A pool error (the server went away) must not crash the process; the next query reports it.
  pool.on('error', () => {});
  return new Kysely<Database>({ dialect: new PostgresDialect({ pool }) });
}
