/**
 * `npm test`: a wiped .data/test, its own cluster and fakes on the test ports (so it runs beside
 * `npm start`), then the unit, api and e2e phases. The last line is always `N passed, N failed`.
 * `npm test -- <filter>` passes file filters to vitest.
 */
import { mkdirSync, rmSync } from 'node:fs';
import path from 'node:path';
import { profileAppEnv, type Env } from './lib/app-env';
import { ensurePackages, testPackages } from './lib/apt';
import { prepareCluster } from './lib/database';
import { stopLeftoverChildren } from './lib/leftovers';
import { errorMessage, log, paint } from './lib/output';
import { dataPaths, root } from './lib/paths';
import { appDatabaseUrl, recreateDatabase, stopLeftover, type Cluster } from './lib/postgres';
import { assertPortFree, HOST, portsOf, profiles } from './lib/ports';
import { startChild, Supervisor } from './lib/processes';
import { buildWeb, loadDemoAccounts, migrateAndSeed, startApp, startFakes } from './lib/services';
import { countVitestRun, formatSummary, type PhaseResult } from './lib/summary';

const ports = profiles.test;
const { dataDir, pgDir, runDir } = dataPaths('test');
const filters = process.argv.slice(2);
const supervisor = new Supervisor();
const results: PhaseResult[] = [];
const startedAt = performance.now();
let finished = false;

/** Stops everything, prints the durations and, as the very last line, the summary. */
async function finish(extra?: PhaseResult): Promise<never> {
  if (finished) return new Promise<never>(() => {});
  finished = true;
  await supervisor.stopAll();
  // After the stopped phases have recorded themselves, so the reason reads last.
  await new Promise((resolve) => setImmediate(resolve));
  if (extra) results.push(extra);
  const lines = formatSummary(results, performance.now() - startedAt);
  process.stdout.write(`\n${lines.join('\n')}\n`);
  const failed = results.some((phase) => phase.failed > 0);
  process.exit(failed ? 1 : 0);
}

supervisor.handleSignals(async (reason) => {
  await finish({ name: 'interrupted', ms: 0, passed: 0, failed: 1, setup: true, note: reason });
});

/** Runs a set-up step; a failure is recorded as one failed phase. Returns whether it worked. */
async function step<T>(name: string, run: () => Promise<T>): Promise<T | null> {
  const started = performance.now();
  try {
    const value = await run();
    results.push({ name, ms: performance.now() - started, passed: 0, failed: 0, setup: true });
    return value;
  } catch (error) {
    log(paint('red', `${name} failed: ${errorMessage(error)}`));
    results.push({ name, ms: performance.now() - started, passed: 0, failed: 1, setup: true, note: errorMessage(error).split('\n')[0] });
    return null;
  }
}

/** One vitest run: default reporter on the console, JSON report in .data/test/<phase>.json. */
async function vitestPhase(name: string, projects: string[], env: NodeJS.ProcessEnv): Promise<void> {
  if (supervisor.isStopping) return;
  const started = performance.now();
  const report = path.join(dataDir, `${name}.json`);
  const args = [
    path.join(root, 'node_modules', 'vitest', 'vitest.mjs'),
    'run',
    ...projects.flatMap((project) => ['--project', project]),
    '--reporter=default',
    '--reporter=json',
    `--outputFile.json=${report}`,
    ...(filters.length > 0 ? ['--passWithNoTests', ...filters] : []),
  ];
  log(`phase ${name}: vitest ${projects.map((p) => `--project ${p}`).join(' ')}`);
  const child = supervisor.own(startChild({ name: `vitest ${name}`, command: process.execPath, args, cwd: root, env, inherit: true }));
  const info = await child.exited;
  results.push({ name, ms: performance.now() - started, ...countVitestRun(report, info.code) });
}

/** Vitest sets NODE_ENV=test itself; the app profile's NODE_ENV must not leak into test runs. */
function testEnv(extra: Env): NodeJS.ProcessEnv {
  const env: NodeJS.ProcessEnv = { ...process.env, ...extra, TZ: 'UTC' };
  delete env.NODE_ENV;
  return env;
}

async function e2ePhase(cluster: Cluster, app: Env): Promise<void> {
  const started = performance.now();
  try {
    await recreateDatabase(cluster, 'pinfield_e2e');
    await migrateAndSeed(app);
    await buildWeb(supervisor);
    const appChild = await startApp(supervisor, { app, runDir, name: 'e2e app' });
    results.push({ name: 'e2e set-up', ms: performance.now() - started, passed: 0, failed: 0, setup: true });
    await vitestPhase(
      'e2e',
      ['e2e'],
      testEnv({
        E2E_BASE_URL: app.PUBLIC_URL ?? '',
        E2E_INBOX_URL: `http://${HOST}:${ports.mailWeb}`,
        E2E_OIDC_URL: `http://${HOST}:${ports.oidc}`,
        E2E_CDP_PORT: String(ports.cdp),
        E2E_DATABASE_URL: app.DATABASE_URL ?? '',
      }),
    );
    await appChild.stop();
  } catch (error) {
    log(paint('red', `e2e set-up failed: ${errorMessage(error)}`));
    results.push({
      name: 'e2e set-up',
      ms: performance.now() - started,
      passed: 0,
      failed: 1,
      setup: true,
      note: errorMessage(error).split('\n')[0],
    });
  }
}

async function main(): Promise<void> {
  // Request logs of the shared e2e app would bury the test output; LOG_LEVEL=info brings them back.
  const app = { ...profileAppEnv(ports, { root, database: 'pinfield_e2e' }), LOG_LEVEL: process.env.LOG_LEVEL || 'warn' };
  const ready = await step('set-up', async () => {
    ensurePackages(testPackages);
    await stopLeftoverChildren(runDir, root);
    stopLeftover(pgDir);
    rmSync(dataDir, { recursive: true, force: true });
    rmSync(path.join(root, 'test-results', 'screenshots'), { recursive: true, force: true });
    mkdirSync(dataDir, { recursive: true });
    for (const port of portsOf(ports)) {
      await assertPortFree(port, 'test profile', 'Is another `npm test` running? Wait for it or stop it.');
    }
    const cluster = await prepareCluster(supervisor, {
      dir: pgDir,
      port: ports.postgres,
      throwaway: true,
      databases: ['pinfield'],
      runDir,
    });
    const accounts = await loadDemoAccounts();
    await startFakes(supervisor, { ports, dataDir, app, accounts, runDir });
    return cluster;
  });
  if (!ready) return void (await finish());

  await vitestPhase('unit', ['unit', 'web'], testEnv({}));
  // The api tests get the test fakes' addresses too (mail, S3); the lead's global set-up builds
  // its template database through PINFIELD_TEST_ADMIN_URL.
  await vitestPhase(
    'api',
    ['api'],
    testEnv({
      ...app,
      DATABASE_URL: appDatabaseUrl(ports.postgres, 'pinfield'),
      PINFIELD_TEST_ADMIN_URL: appDatabaseUrl(ports.postgres, 'postgres'),
      PINFIELD_TEST_INBOX_URL: `http://${HOST}:${ports.mailWeb}`,
    }),
  );
  if (!supervisor.isStopping) await e2ePhase(ready, app);
  await finish();
}

main().catch(async (error: unknown) => {
  log(paint('red', errorMessage(error)));
  await finish({ name: 'crashed', ms: 0, passed: 0, failed: 1, setup: true, note: errorMessage(error).split('\n')[0] });
});
