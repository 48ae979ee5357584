import path from 'node:path';

/** The repository root (scripts/lib/../..). */
export const root = path.resolve(import.meta.dirname, '..', '..');

/** `npm start`/`dev` keep data in .data/local; `npm test` wipes and uses .data/test. */
export function dataPaths(profile: 'local' | 'test') {
  const dataDir = path.join(root, '.data', profile);
  return { dataDir, pgDir: path.join(dataDir, 'pg'), runDir: path.join(dataDir, 'run') };
}
