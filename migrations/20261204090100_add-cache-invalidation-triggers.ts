import type { Knex } from 'knex';

/**
 * Every change that a process-local cache (sessions, the signed-in actor, assignment contexts) could
 * hold is announced on the `pinfield_cache` channel at commit, whoever made it: the API, the seed, a
 * script or psql. api/src/auth/cache-invalidation.ts listens. Payloads: '<kind>:<id>', with a session
 * id sent only as its md5.
 */

const TABLES: { table: string; events: string; when?: string }[] = [
  { table: 'sessions', events: 'DELETE' },
  // connect-pg-simple's touch changes only `expire`; only a changed session body matters.
  { table: 'sessions', events: 'UPDATE', when: "(OLD.sess::jsonb - 'cookie') IS DISTINCT FROM (NEW.sess::jsonb - 'cookie')" },
  { table: 'users', events: 'UPDATE OR DELETE' },
  { table: 'memberships', events: 'INSERT OR UPDATE OR DELETE' },
  { table: 'schools', events: 'UPDATE OR DELETE' },
  { table: 'classes', events: 'UPDATE OR DELETE' },
  { table: 'enrolments', events: 'INSERT OR UPDATE OR DELETE' },
  { table: 'assignments', events: 'UPDATE OR DELETE' },
];

const triggerName = (table: string, events: string) => `pinfield_cache_${table}_${events.split(' ')[0]!.toLowerCase()}`;

export async function up(knex: Knex): Promise<void> {
  await knex.raw(`
    CREATE FUNCTION pinfield_cache_notify() RETURNS trigger LANGUAGE plpgsql AS $$
    DECLARE
      changed record;
    BEGIN
      IF TG_OP = 'DELETE' THEN changed := OLD; ELSE changed := NEW; END IF;
      CASE TG_TABLE_NAME
        WHEN 'sessions' THEN
          PERFORM pg_notify('pinfield_cache', 'session:' || md5(changed.sid));
        WHEN 'users', 'schools', 'classes', 'assignments' THEN
          PERFORM pg_notify('pinfield_cache', CASE TG_TABLE_NAME WHEN 'users' THEN 'user' WHEN 'schools' THEN 'school'
            WHEN 'classes' THEN 'class' ELSE 'assignment' END || ':' || changed.id);
        WHEN 'memberships' THEN
          PERFORM pg_notify('pinfield_cache', 'user:' || changed.user_id);
          IF TG_OP = 'UPDATE' THEN PERFORM pg_notify('pinfield_cache', 'user:' || OLD.user_id); END IF;
        WHEN 'enrolments' THEN
          PERFORM pg_notify('pinfield_cache', 'enrolment:' || changed.class_id || ':' || changed.student_id);
          IF TG_OP = 'UPDATE' THEN PERFORM pg_notify('pinfield_cache', 'enrolment:' || OLD.class_id || ':' || OLD.student_id); END IF;
      END CASE;
      RETURN NULL;
    END $$`);
  for (const { table, events, when } of TABLES) {
    await knex.raw(
      `CREATE TRIGGER ${triggerName(table, events)} AFTER ${events} ON ${table} FOR EACH ROW ${when ? `WHEN (${when}) ` : ''}EXECUTE FUNCTION pinfield_cache_notify()`,
    );
  }
}

export async function down(knex: Knex): Promise<void> {
  for (const { table, events } of TABLES) await knex.raw(`DROP TRIGGER ${triggerName(table, events)} ON ${table}`);
  await knex.raw('DROP FUNCTION pinfield_cache_notify()');
}
