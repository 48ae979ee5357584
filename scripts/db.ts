/**
 * `npm run db:migrate | db:rollback | db:seed` against DATABASE_URL (default: the `npm start`
 * cluster, started for the command when it is not running and stopped again afterwards).
 * `rollback` reverts the last batch; `rollback --all` reverts every migration.
 */
import { mkdirSync } from 'node:fs';
import { appDatabaseUrl } from './lib/postgres';
import { ensurePackages } from './lib/apt';
import { prepareCluster, targetsLocalCluster } from './lib/database';
import { errorMessage, log, paint } from './lib/output';
import { dataPaths } from './lib/paths';
import { profiles } from './lib/ports';
import { Supervisor } from './lib/processes';

const usage = 'Usage: tsx scripts/db.ts <migrate|rollback [--all]|seed>';
const supervisor = new Supervisor();
supervisor.handleSignals(async () => supervisor.exit(130));

async function main(): Promise<void> {
  const [command, ...rest] = process.argv.slice(2);
  if (command !== 'migrate' && command !== 'rollback' && command !== 'seed') {
    throw new Error(`Unknown command "${command ?? ''}". ${usage}`);
  }
  const unknown = rest.filter((arg) => !(command === 'rollback' && arg === '--all'));
  if (unknown.length > 0) throw new Error(`Unexpected argument(s): ${unknown.join(' ')}. ${usage}`);

  const port = profiles.start.postgres;
  const databaseUrl = process.env.DATABASE_URL || appDatabaseUrl(port, 'pinfield');
  const target = targetsLocalCluster(databaseUrl, port);
  if (target.local) {
    // Seed steps make their demo media with ffmpeg.
    ensurePackages(command === 'seed' ? ['postgresql', 'ffmpeg'] : ['postgresql']);
    const { dataDir, pgDir, runDir } = dataPaths('local');
    mkdirSync(dataDir, { recursive: true });
    await prepareCluster(supervisor, { dir: pgDir, port, throwaway: false, databases: [target.database], runDir });
  }

  if (command === 'seed') {
    const { seed } = await import('../api/src/seed/seeder');
    const names = await seed(databaseUrl);
    log(names.length > 0 ? `seed steps run: ${names.join(', ')}` : 'seed steps: all already run');
  } else {
    const { migrate } = await import('../api/src/db/migrator');
    const action = command === 'migrate' ? 'latest' : rest.includes('--all') ? 'rollback-all' : 'rollback';
    const names = await migrate(databaseUrl, action);
    const verb = command === 'migrate' ? 'applied' : 'rolled back';
    log(names.length > 0 ? `migrations ${verb}: ${names.join(', ')}` : `no migrations to ${command === 'migrate' ? 'apply' : 'roll back'}`);
  }
}

main().then(
  () => supervisor.exit(0),
  async (error: unknown) => {
    log(paint('red', errorMessage(error)));
    await supervisor.exit(1);
  },
);
