import pg from 'pg';
import { randomBytes } from 'node:crypto';
import { createKnex } from '../src/db/knex';
import { COPY_PREFIX, TEMPLATE_DB, databaseUrl } from './global-setup';
import type { Knex } from 'knex';

export interface TestDatabase {
  url: string;
  knex: Knex;
  drop(): Promise<void>;
}

async function admin<T>(work: (client: pg.Client) => Promise<T>): Promise<T> {
  const client = new pg.Client({ connectionString: databaseUrl('postgres') });
  await client.connect();
  try {
    return await work(client);
  } finally {
    await client.end();
  }
}

/** A fresh database copied from the migrated template, so test files never share rows. */
export async function createTestDatabase(): Promise<TestDatabase> {
  const name = `${COPY_PREFIX}${randomBytes(6).toString('hex')}`;
  await admin((client) => client.query(`CREATE DATABASE ${name} TEMPLATE ${TEMPLATE_DB}`));
  const url = databaseUrl(name);
  const knex = createKnex(url, { min: 0, max: 5 });
  return {
    url,
    knex,
    async drop() {
      await knex.destroy();
      await admin((client) => client.query(`DROP DATABASE IF EXISTS ${name} WITH (FORCE)`));
    },
  };
}

/** An empty database with nothing migrated, for migration tests. */
export async function createEmptyDatabase(): Promise<{ url: string; drop(): Promise<void> }> {
  const name = `${COPY_PREFIX}${randomBytes(6).toString('hex')}`;
  await admin((client) => client.query(`CREATE DATABASE ${name}`));
  return {
    url: databaseUrl(name),
    drop: () => admin((client) => client.query(`DROP DATABASE IF EXISTS ${name} WITH (FORCE)`)).then(() => undefined),
  };
}
