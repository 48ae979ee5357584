import { createKnex } from './knex';

type Action = 'latest' | 'rollback' | 'rollback-all';

/** Runs the Knex migrations; returns the names of those applied or reverted. */
export async function migrate(databaseUrl: string, action: Action): Promise<string[]> {
  const knex = createKnex(databaseUrl, { min: 0, max: 1 });
  try {
    const [, names] = action === 'latest' ? await knex.migrate.latest() : await knex.migrate.rollback(undefined, action === 'rollback-all');
    return names as string[];
  } finally {
    await knex.destroy();
  }
}
