import path from 'node:path';
import { childEnv, type Env } from './app-env';
import { recordChild } from './leftovers';
import { log } from './output';
import { root } from './paths';
import { HOST, type PortProfile } from './ports';
import { describeExit, startChild, waitForHttp, type ManagedChild, type Supervisor } from './processes';
import { isWebBuildFresh } from './web-build';

/** Runs a TypeScript entry through tsx in one Node process (no extra tsx CLI wrapper process). */
export function tsxArgs(entry: string, ...args: string[]): string[] {
  return ['--import', 'tsx', entry, ...args];
}

export interface DemoAccount {
  email: string;
  name: string;
  roles: string[];
  label: string;
}

export async function loadDemoAccounts(): Promise<DemoAccount[]> {
  const module = (await import('../../api/src/seed/demo-roster')) as { demoAccounts: DemoAccount[] };
  return module.demoAccounts;
}

/** Starts `fake-services/main.ts` configured from the app's own settings, so both sides agree. */
export async function startFakes(
  supervisor: Supervisor,
  options: { ports: PortProfile; dataDir: string; app: Env; accounts: DemoAccount[]; runDir: string; corsOrigins?: string[] },
): Promise<ManagedChild> {
  const { ports, app } = options;
  const env: Env = {
    FAKE_HOST: HOST,
    FAKE_DATA_DIR: options.dataDir,
    FAKE_S3_PORT: String(ports.s3),
    FAKE_OIDC_PORT: String(ports.oidc),
    FAKE_SMTP_PORT: String(ports.smtp),
    FAKE_MAIL_WEB_PORT: String(ports.mailWeb),
    FAKE_OIDC_CLIENT_ID: app.GOOGLE_CLIENT_ID ?? '',
    FAKE_OIDC_CLIENT_SECRET: app.GOOGLE_CLIENT_SECRET ?? '',
    FAKE_OIDC_ACCOUNTS: JSON.stringify(options.accounts.map(({ email, name, label }) => ({ email, name, label }))),
    FAKE_S3_BUCKET: app.S3_BUCKET ?? '',
    FAKE_S3_CORS_ORIGINS: (options.corsOrigins ?? [app.PUBLIC_URL ?? '']).join(','),
  };
  const fakes = supervisor.own(
    startChild({ name: 'fakes', command: process.execPath, args: tsxArgs('fake-services/main.ts'), cwd: root, env: childEnv({}, env) }),
  );
  recordChild(options.runDir, fakes);
  await fakes.waitForLine(/^fakes ready/, 60_000);
  return fakes;
}

/** Starts the API (which serves the built web app) and waits for GET /api/health. */
export async function startApp(supervisor: Supervisor, options: { app: Env; runDir: string; name?: string }): Promise<ManagedChild> {
  const app = supervisor.own(
    startChild({
      name: options.name ?? 'app',
      command: process.execPath,
      args: tsxArgs('api/src/server.ts'),
      cwd: root,
      env: childEnv(options.app),
    }),
  );
  recordChild(options.runDir, app);
  await waitForHttp(`http://${options.app.HOST}:${options.app.PORT}/api/health`, 90_000, app);
  return app;
}

/** `vite build`, skipped when web/dist is newer than every input. Returns whether it built. */
export async function buildWeb(supervisor: Supervisor, options: { force?: boolean } = {}): Promise<boolean> {
  if (!options.force && isWebBuildFresh(root)) {
    log('web/dist is up to date: skipping vite build');
    return false;
  }
  const vite = path.join(root, 'node_modules', 'vite', 'bin', 'vite.js');
  await runToCompletion(supervisor, 'vite build', process.execPath, [vite, 'build', '--config', 'web/vite.config.ts']);
  return true;
}

/** Runs a command with our output, stopped with the rest on Ctrl-C; rejects on a non-zero exit. */
export async function runToCompletion(
  supervisor: Supervisor,
  label: string,
  command: string,
  args: string[],
  env: NodeJS.ProcessEnv = process.env,
): Promise<void> {
  const child = supervisor.own(startChild({ name: label, command, args, cwd: root, env, inherit: true }));
  const info = await child.exited;
  if (info.code !== 0) throw new Error(`${label} failed (${describeExit(info)})`);
}

/** Applies the Knex migrations and the seed steps (each runs once; see api/src/seed) with the app's settings. */
export async function migrateAndSeed(app: Env): Promise<void> {
  const databaseUrl = app.DATABASE_URL ?? '';
  const { migrate } = await import('../../api/src/db/migrator');
  const { seed } = await import('../../api/src/seed/seeder');
  const migrated = await migrate(databaseUrl, 'latest');
  log(migrated.length > 0 ? `migrations applied: ${migrated.join(', ')}` : 'migrations: already up to date');
  const seeded = await seed(databaseUrl, undefined, app);
  log(seeded.length > 0 ? `seed steps run: ${seeded.join(', ')}` : 'seed steps: all already run');
}
