/**
 * `npm run dev`: the start profile's cluster, fakes, migrations and seed steps, then the API
 * under `tsx watch` (restarts on change) and the Vite dev server on 4316, which proxies /api to
 * the API. Open the Vite address: PUBLIC_URL points there so sign-in redirects come back to it.
 */
import { mkdirSync } from 'node:fs';
import path from 'node:path';
import { childEnv, profileAppEnv, withUserOverrides } from './lib/app-env';
import { ensurePackages, startPackages } from './lib/apt';
import { prepareCluster, targetsLocalCluster } from './lib/database';
import { recordChild, stopLeftoverChildren } from './lib/leftovers';
import { errorMessage, log, paint } from './lib/output';
import { dataPaths, root } from './lib/paths';
import { assertPortFree, HOST, profiles } from './lib/ports';
import { describeExit, startChild, Supervisor, waitForHttp } from './lib/processes';
import { loadDemoAccounts, migrateAndSeed, startFakes } from './lib/services';
import { validateAppEnv } from './lib/validate-env';

const supervisor = new Supervisor();
supervisor.handleSignals();

async function main(): Promise<void> {
  const ports = profiles.start;
  const { dataDir, pgDir, runDir } = dataPaths('local');
  const viteUrl = `http://${HOST}:${ports.viteDev}`;
  const app = withUserOverrides({ ...profileAppEnv(ports, { root, database: 'pinfield' }), PUBLIC_URL: viteUrl }, process.env);
  await validateAppEnv(app);

  ensurePackages(startPackages);
  await stopLeftoverChildren(runDir, root);
  const hint = 'Is `npm start` or `npm run dev` already running? Stop it first.';
  for (const port of [Number(app.PORT), ports.viteDev ?? 0, ports.s3, ports.oidc, ports.smtp, ports.mailWeb]) {
    await assertPortFree(port, 'npm run dev', hint);
  }
  mkdirSync(dataDir, { recursive: true });
  const target = targetsLocalCluster(app.DATABASE_URL ?? '', ports.postgres);
  if (target.local) {
    await prepareCluster(supervisor, { dir: pgDir, port: ports.postgres, throwaway: false, databases: [target.database], runDir });
  }
  const accounts = await loadDemoAccounts();
  await startFakes(supervisor, { ports, dataDir, app, accounts, runDir, corsOrigins: [viteUrl, `http://${HOST}:${app.PORT}`] });
  await migrateAndSeed(app);

  const api = supervisor.own(
    startChild({
      name: 'api',
      command: process.execPath,
      args: [path.join(root, 'node_modules', 'tsx', 'dist', 'cli.mjs'), 'watch', '--clear-screen=false', 'api/src/server.ts'],
      cwd: root,
      env: childEnv(app),
    }),
  );
  recordChild(runDir, api);
  await waitForHttp(`http://${app.HOST}:${app.PORT}/api/health`, 90_000, api);
  const vite = supervisor.own(
    startChild({
      name: 'vite',
      command: process.execPath,
      args: [
        path.join(root, 'node_modules', 'vite', 'bin', 'vite.js'),
        '--config',
        'web/vite.config.ts',
        '--host',
        HOST,
        '--port',
        String(ports.viteDev),
        '--strictPort',
      ],
      cwd: root,
      env: childEnv({}),
    }),
  );
  recordChild(runDir, vite);
  await waitForHttp(`${viteUrl}/`, 60_000, vite);

  log(
    paint(
      'bold',
      `dev servers ready: open ${paint('green', viteUrl)} (API on ${app.HOST}:${app.PORT}, inbox http://${HOST}:${ports.mailWeb}/). Ctrl-C stops everything.`,
    ),
  );
  const ended = await Promise.race([
    api.exited.then((info) => ({ who: 'api', info })),
    vite.exited.then((info) => ({ who: 'vite', info })),
  ]);
  if (supervisor.isStopping) return;
  log(paint('red', `${ended.who} stopped (${describeExit(ended.info)}): stopping everything`));
  await supervisor.exit(1);
}

main().catch(async (error: unknown) => {
  if (supervisor.isStopping) return;
  log(paint('red', errorMessage(error)));
  await supervisor.exit(1);
});
