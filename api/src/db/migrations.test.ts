import pg from 'pg';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { migrate } from './migrator';
import { createEmptyDatabase } from '../../test/test-db';

async function tables(url: string): Promise<string[]> {
  const client = new pg.Client({ connectionString: url });
  await client.connect();
  const { rows } = await client.query<{ table_name: string }>(
    "SELECT table_name FROM information_schema.tables WHERE table_schema = 'public' ORDER BY table_name",
  );
  await client.end();
  return rows.map((row) => row.table_name);
}

describe('migrations', () => {
  let database: Awaited<ReturnType<typeof createEmptyDatabase>>;
  beforeAll(async () => {
    database = await createEmptyDatabase();
  });
  afterAll(() => database.drop());

  it('go up, all the way down, and up again on an empty database', async () => {
    const applied = await migrate(database.url, 'latest');
    expect(applied.length).toBeGreaterThan(0);
    expect(await tables(database.url)).toEqual(
      expect.arrayContaining([
        'schools',
        'users',
        'memberships',
        'classes',
        'enrolments',
        'sessions',
        'sign_in_tokens',
        'audit_events',
        'seed_steps',
      ]),
    );

    const reverted = await migrate(database.url, 'rollback-all');
    expect(reverted).toHaveLength(applied.length);
    expect((await tables(database.url)).filter((name) => !name.startsWith('knex_'))).toEqual([]);

    expect(await migrate(database.url, 'latest')).toEqual(applied);
  });
});
