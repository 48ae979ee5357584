/**
 * `npm run worker`: the recording worker alone, for scale-out. Start as many as the machine has
 * cores to spare (each runs one ffmpeg at a time); set WORKER=off on the API processes so
 * transcoding stays off their CPUs. Same settings as the app (DATABASE_URL, S3_*, FFMPEG_NICE, ...).
 */
import { loadEnv, type Env } from './env';
import { createKnex } from './db/knex';
import { createLogger } from './logger';
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

const logger = createLogger(env.LOG_LEVEL).child({ process: 'worker' });
const db = createKnex(env.DATABASE_URL, { min: 0, max: 4 });
const storage = createObjectStorage(storageConfigFromEnv(env));

let queue: PgBossJobQueue;
let worker: RecordingWorker;
try {
  queue = await createJobQueue({ databaseUrl: env.DATABASE_URL, db, settings: queueSettingsFromEnv(env), logger, maintenance: true });
  worker = await startWorker({ queue, db, storage, logger, nice: env.FFMPEG_NICE, uploadAbandonHours: env.UPLOAD_ABANDON_HOURS });
} catch (error) {
  fail(`Could not start the worker: ${(error as Error).message}`);
}
if (env.WORKER === 'in-process') {
  logger.info('the API also runs a worker (WORKER=in-process): jobs are shared between them');
}
logger.info({ database: new URL(env.DATABASE_URL).pathname.slice(1), bucket: env.S3_BUCKET }, 'pinfield worker ready; Ctrl-C stops it');

async function shutdown(signal: string): Promise<void> {
  logger.info({ signal }, 'worker shutting down');
  await worker.stop();
  await queue.stop().catch((error: unknown) => logger.warn({ err: error }, 'job queue did not stop cleanly'));
  await db.destroy();
  process.exit(0);
}
process.once('SIGTERM', () => void shutdown('SIGTERM'));
process.once('SIGINT', () => void shutdown('SIGINT'));
