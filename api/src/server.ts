import pg from 'pg';
import { loadEnv, type Env } from './env';
import { createKnex } from './db/knex';
import { createSmtpMailer } from './mail/mailer';
import { createLogger } from './logger';
import { createApp } from './app';
import { demoAccounts } from './seed/demo-roster';
import { createObjectStorage, storageConfigFromEnv } from './storage/object-storage';
import { createJobQueue, type PgBossJobQueue } from './jobs/pg-boss-queue';
import { queueSettingsFromEnv } from './jobs/queue-settings';
import { startWorker, type RecordingWorker } from './jobs/start-worker';

function fail(message: string): never {
  process.stderr.write(`${message}\n`);
  process.exit(1);
}

let env: Env;
try {
  env = loadEnv();
} catch (error) {
  fail((error as Error).message);
}

const logger = createLogger(env.LOG_LEVEL);
const db = createKnex(env.DATABASE_URL);
const pool = new pg.Pool({ connectionString: env.DATABASE_URL, max: 5 });
const mailer = createSmtpMailer(env.SMTP_URL, env.MAIL_FROM);
const storage = createObjectStorage(storageConfigFromEnv(env));
const inProcess = env.WORKER === 'in-process';

let jobs: PgBossJobQueue;
let worker: RecordingWorker | null = null;
try {
  // With the worker in this process, this process also expires stuck jobs and fires the schedule.
  jobs = await createJobQueue({ databaseUrl: env.DATABASE_URL, db, settings: queueSettingsFromEnv(env), logger, maintenance: inProcess });
  if (inProcess) {
    worker = await startWorker({ queue: jobs, db, storage, logger, nice: env.FFMPEG_NICE, uploadAbandonHours: env.UPLOAD_ABANDON_HOURS });
  } else {
    logger.info('WORKER=off: recordings are queued here and processed by `npm run worker`');
  }
} catch (error) {
  fail(`Could not start the job queue: ${(error as Error).message}`);
}
const app = createApp({ env, db, pool, mailer, logger, storage, jobs, demoAccounts });

const server = app.listen(env.PORT, env.HOST, () => {
  logger.info({ url: env.PUBLIC_URL, worker: env.WORKER }, 'pinfield api listening');
});
server.on('error', (error) => fail(`Could not listen on ${env.HOST}:${env.PORT}: ${error.message}`));

/** Stops taking requests, lets the worker finish or hand back its job (see RecordingWorker.stop), then closes connections. */
async function shutdown(signal: string): Promise<void> {
  logger.info({ signal }, 'shutting down');
  server.close();
  server.closeAllConnections();
  await worker?.stop();
  await jobs.stop().catch((error: unknown) => logger.warn({ err: error }, 'job queue did not stop cleanly'));
  mailer.close();
  await Promise.allSettled([db.destroy(), pool.end()]);
  process.exit(0);
}
process.once('SIGTERM', () => void shutdown('SIGTERM'));
process.once('SIGINT', () => void shutdown('SIGINT'));
