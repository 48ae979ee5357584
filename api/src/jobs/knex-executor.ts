import type { Knex } from 'knex';
import type PgBoss from 'pg-boss';

/**
 * What pg would send for a value, in a form Knex accepts: Knex refuses undefined, even inside an
 * object, where pg sends NULL or drops the key (it JSON-encodes plain objects itself).
 */
function binding(value: unknown): unknown {
  if (value === undefined) return null;
  const plainObject = typeof value === 'object' && value !== null && Object.getPrototypeOf(value) === Object.prototype;
  return plainObject ? JSON.stringify(value) : value;
}

/**
 * Lets pg-boss run its SQL through Knex (`send(..., { db })`), so a job is written in the caller's
 * transaction and exists exactly when that transaction commits. pg-boss writes `$1` placeholders;
 * Knex wants `?` with its bindings in order of appearance, and a literal `?` escaped.
 */
export function knexExecutor(db: Knex | Knex.Transaction): PgBoss.Db {
  return {
    async executeSql(text: string, values: unknown[] = []) {
      const bindings: unknown[] = [];
      const sql = text.replace(/\?/g, '\\?').replace(/\$(\d+)/g, (_match, index: string) => {
        bindings.push(binding(values[Number(index) - 1]));
        return '?';
      });
      const result = await db.raw<{ rows: unknown[] }>(sql, bindings as Knex.RawBinding[]);
      return { rows: result.rows };
    },
  };
}
