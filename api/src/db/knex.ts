import knexFactory, { type Knex } from 'knex';
import pg from 'pg';
import { fileURLToPath } from 'node:url';
import { migrationSource } from './migration-source';

// COUNT(*) and bigint ids come back as strings by default; our counts stay far below 2^53.
pg.types.setTypeParser(pg.types.builtins.INT8, (value) => Number(value));

export const MIGRATIONS_DIR = fileURLToPath(new URL('../../../migrations', import.meta.url));

/** A Knex instance for the app, scripts and tests; callers own `destroy()`. */
export function createKnex(databaseUrl: string, pool: Knex.PoolConfig = { min: 0, max: 10 }): Knex {
  return knexFactory({
    client: 'pg',
    connection: databaseUrl,
    pool,
    migrations: { migrationSource: migrationSource(MIGRATIONS_DIR), tableName: 'knex_migrations' },
  });
}

export type Db = Knex | Knex.Transaction;
