/**
 * Run as a child process by worker-death.test.ts: the real worker, except that its ffmpeg step
 * never ends, so the test can kill the process in the middle of a job (SIGKILL: no clean-up runs,
 * exactly like a crash or a lost machine). Prints `stalled` once it holds a job.
 */
import { loadEnv } from '../env';
import { createKnex } from '../db/knex';
import { createLogger } from '../logger';
import { createObjectStorage, storageConfigFromEnv } from '../storage/object-storage';
import { createJobQueue } from './pg-boss-queue';
import { startWorker } from './start-worker';
import type { ProcessMedia } from './process-recording';

const env = loadEnv();
const logger = createLogger('silent');
const db = createKnex(env.DATABASE_URL, { min: 0, max: 2 });
const settings = { expireInSeconds: 600, retryLimit: 3, retryDelaySeconds: 1 };
const queue = await createJobQueue({ databaseUrl: env.DATABASE_URL, db, settings, logger, maintenance: false });

const stalls: ProcessMedia = () => {
  process.stdout.write('stalled\n');
  return new Promise(() => undefined);
};
await startWorker({
  queue,
  db,
  storage: createObjectStorage(storageConfigFromEnv(env)),
  logger,
  nice: env.FFMPEG_NICE,
  uploadAbandonHours: env.UPLOAD_ABANDON_HOURS,
  processMedia: stalls,
  pollingIntervalSeconds: 0.5,
});
process.stdout.write('worker up\n');
