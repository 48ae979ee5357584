import pg from 'pg';
import { migrate } from '../src/db/migrator';

/** Lets several people run API tests on one cluster at once: each prefix has its own template and copies. */
export const DB_PREFIX = /^[a-z][a-z0-9_]{0,30}$/.test(process.env.PINFIELD_TEST_DB_PREFIX ?? '')
  ? process.env.PINFIELD_TEST_DB_PREFIX!
  : 'pinfield';
export const TEMPLATE_DB = `${DB_PREFIX}_template`;
export const COPY_PREFIX = `${DB_PREFIX}_t_`;

function adminUrl(): string {
  const url = process.env.PINFIELD_TEST_ADMIN_URL;
  if (!url) throw new Error('PINFIELD_TEST_ADMIN_URL is not set: run the API tests through `npm test`, which starts the test database.');
  return url;
}

export function databaseUrl(name: string): string {
  const url = new URL(adminUrl());
  url.pathname = `/${name}`;
  return url.toString();
}

/** Migrates once into a template database; every test file then copies it (see test-db.ts). */
export default async function setup(): Promise<() => Promise<void>> {
  const admin = new pg.Client({ connectionString: adminUrl() });
  await admin.connect();
  await admin.query(`DROP DATABASE IF EXISTS ${TEMPLATE_DB} WITH (FORCE)`);
  await admin.query(`CREATE DATABASE ${TEMPLATE_DB}`);
  await admin.end();
  await migrate(databaseUrl(TEMPLATE_DB), 'latest');
  return async () => {
    const client = new pg.Client({ connectionString: adminUrl() });
    await client.connect();
    const { rows } = await client.query<{ datname: string }>('SELECT datname FROM pg_database WHERE starts_with(datname, $1)', [
      COPY_PREFIX,
    ]);
    for (const row of rows) await client.query(`DROP DATABASE IF EXISTS ${row.datname} WITH (FORCE)`);
    await client.end();
  };
}
