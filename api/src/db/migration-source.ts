import type { Knex } from 'knex';
import { readdir } from 'node:fs/promises';
import path from 'node:path';
import { pathToFileURL } from 'node:url';

/**
 * Lists and imports the TypeScript migrations ourselves: Knex's own loader uses Node's import(),
 * which cannot read .ts under the test runner; an import() written here is transformed by it.
 */
export function migrationSource(directory: string): Knex.MigrationSource<string> {
  return {
    async getMigrations() {
      return (await readdir(directory)).filter((file) => /^\d{14}_[a-z0-9-]+\.ts$/.test(file)).sort();
    },
    getMigrationName: (file) => file,
    getMigration: (file) => import(pathToFileURL(path.join(directory, file)).href),
  };
}
