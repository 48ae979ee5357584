import type { Knex } from 'knex';
import PgBoss from 'pg-boss';

/** The schema pg-boss keeps its queues in; `createJobQueue` and the worker use the same name. */
const SCHEMA = 'pgboss';

// pg-boss's construction plan is one script with its own BEGIN/COMMIT and advisory lock, so it
// cannot run inside Knex's migration transaction; it is atomic by itself.
export const config = { transaction: false };

/**
 * Installs pg-boss's tables with pg-boss's own construction plan, so every database that Knex
 * migrates (the local one, the API test template, production) has the job queue. The app starts
 * pg-boss with `migrate: false`: schema changes to it happen here only, never at app start.
 */
export async function up(knex: Knex): Promise<void> {
  const installed = await knex.raw<{ rows: { name: string | null }[] }>('SELECT to_regclass(?) AS name', [`${SCHEMA}.version`]);
  // A run that died after the plan committed but before Knex recorded it must not install twice.
  if (installed.rows[0]?.name) return;
  await knex.raw(PgBoss.getConstructionPlans(SCHEMA));
}

export async function down(knex: Knex): Promise<void> {
  await knex.raw(`DROP SCHEMA IF EXISTS ${SCHEMA} CASCADE`);
}
