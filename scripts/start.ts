/**
 * `npm start`: Debian packages, the project PostgreSQL cluster, the three fakes, migrations and
 * seed steps, the web build and the app, all on loopback; Ctrl-C stops everything it started.
 */
import { mkdirSync } from 'node:fs';
import path from 'node:path';
import { profileAppEnv, withUserOverrides } from './lib/app-env';
import { ensurePackages, startPackages } from './lib/apt';
import { prepareCluster, targetsLocalCluster } from './lib/database';
import { stopLeftoverChildren } from './lib/leftovers';
import { errorMessage, formatTable, log, paint } from './lib/output';
import { dataPaths, root } from './lib/paths';
import { assertPortFree, HOST, profiles } from './lib/ports';
import { ChildExitedError, describeExit, Supervisor } from './lib/processes';
import { buildWeb, loadDemoAccounts, migrateAndSeed, startApp, startFakes, type DemoAccount } from './lib/services';
import { formatDuration, Stopwatch } from './lib/timing';
import { validateAppEnv } from './lib/validate-env';

const supervisor = new Supervisor();
supervisor.handleSignals();

async function main(): Promise<void> {
  const ports = profiles.start;
  const { dataDir, pgDir, runDir } = dataPaths('local');
  const clock = new Stopwatch();
  const app = withUserOverrides(profileAppEnv(ports, { root, database: 'pinfield' }), process.env);

  // A wrong variable stops the start before anything is started, naming the variable.
  await validateAppEnv(app);

  await clock.time('packages', async () => ensurePackages(startPackages));
  await stopLeftoverChildren(runDir, root);
  const hint = 'Is `npm start` or `npm run dev` already running? Stop it first, or choose another PORT.';
  await assertPortFree(Number(app.PORT), 'the app', hint);
  for (const [port, purpose] of [
    [ports.s3, 'S3 fake'],
    [ports.oidc, 'OpenID Connect fake'],
    [ports.smtp, 'SMTP fake'],
    [ports.mailWeb, 'inbox page'],
  ] as const) {
    await assertPortFree(port, purpose, hint);
  }
  mkdirSync(dataDir, { recursive: true });

  const target = targetsLocalCluster(app.DATABASE_URL ?? '', ports.postgres);
  if (target.local) {
    await clock.time('postgres', () =>
      prepareCluster(supervisor, { dir: pgDir, port: ports.postgres, throwaway: false, databases: [target.database], runDir }),
    );
  } else {
    log('DATABASE_URL points at another server: not starting the project cluster');
  }
  const accounts = await loadDemoAccounts();
  const fakes = await clock.time('fakes', () => startFakes(supervisor, { ports, dataDir, app, accounts, runDir }));
  await clock.time('migrate + seed', () => migrateAndSeed(app));
  await clock.time('web build', () => buildWeb(supervisor));
  const appChild = await clock.time('app', () => startApp(supervisor, { app, runDir }));

  printBanner(app.PUBLIC_URL ?? '', `http://${HOST}:${ports.mailWeb}/`, accounts, dataDir);
  log(
    `ready in ${formatDuration(clock.phases.reduce((sum, phase) => sum + phase.ms, 0))} (${clock.phases.map((p) => `${p.name} ${formatDuration(p.ms)}`).join(', ')})`,
  );

  // Either child ending on its own is a failure: report it and stop the rest.
  const ended = await Promise.race([
    appChild.exited.then((info) => ({ who: 'app', info })),
    fakes.exited.then((info) => ({ who: 'fakes', info })),
  ]);
  if (supervisor.isStopping) return;
  log(paint('red', `${ended.who} stopped unexpectedly (${describeExit(ended.info)}): stopping everything`));
  await supervisor.exit(1);
}

function printBanner(appUrl: string, inboxUrl: string, accounts: DemoAccount[], dataDir: string): void {
  const rows = accounts.map((account) => [account.email, account.roles.join(', '), account.label]);
  const lines = [
    '',
    paint('bold', 'Pinfield is running.'),
    `  Open        ${paint('green', appUrl)}`,
    `  Mail inbox  ${inboxUrl}   (every e-mail the app sends lands here)`,
    '',
    'Demo accounts: choose "Continue with Google" and pick one, or ask for an e-mail link and open it from the inbox.',
    formatTable(['e-mail', 'roles', 'who'], rows).replace(/^/gm, '  '),
    '',
    `Stop with Ctrl-C: it stops the app, the fakes and PostgreSQL. Data stays in ${path.relative(root, dataDir)}/ for the next start.`,
    '',
  ];
  process.stdout.write(`${lines.join('\n')}\n`);
}

main().catch(async (error: unknown) => {
  if (supervisor.isStopping) return;
  if (error instanceof ChildExitedError) {
    log(paint('red', `${error.message}. Its last lines:`));
    for (const line of error.child.tail().slice(-15)) process.stderr.write(`  ${line}\n`);
  } else {
    log(paint('red', errorMessage(error)));
  }
  await supervisor.exit(1);
});
