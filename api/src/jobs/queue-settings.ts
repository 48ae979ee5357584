import type PgBoss from 'pg-boss';
import type { Env } from '../env';
import { QUEUES } from './job-queue';

/** The schema the Knex migration installs pg-boss into. */
export const JOB_SCHEMA = 'pgboss';

/** How processing jobs are retried and timed out; read from the environment, shortened in tests. */
export interface QueueSettings {
  /** An active job that runs longer than this is failed (and retried, while attempts remain). */
  expireInSeconds: number;
  /** Retries after the first attempt: 3 means at most four attempts. */
  retryLimit: number;
  /** Base delay before a retry; doubled with each retry, with jitter (pg-boss retryBackoff). */
  retryDelaySeconds: number;
}

// pg-boss refuses an expiry of 24 hours or more (attorney.js POLICY.MAX_EXPIRATION_HOURS).
const MAX_EXPIRE_SECONDS = 24 * 60 * 60 - 60;

export function queueSettingsFromEnv(env: Pick<Env, 'PROCESSING_TIMEOUT_MINUTES'>): QueueSettings {
  const expireInSeconds = env.PROCESSING_TIMEOUT_MINUTES * 60;
  if (expireInSeconds > MAX_EXPIRE_SECONDS) {
    throw new Error(
      `PROCESSING_TIMEOUT_MINUTES: expected at most ${MAX_EXPIRE_SECONDS / 60} minutes (the job queue limits a job to under 24 hours), got ${env.PROCESSING_TIMEOUT_MINUTES}`,
    );
  }
  // 30 s, then about 1 and 2 minutes: long enough for storage or the database to come back.
  return { expireInSeconds, retryLimit: 3, retryDelaySeconds: 30 };
}

/** The options every processing job is sent with; per job, so they hold whatever the queue row says. */
export function processingJobOptions(settings: QueueSettings, recordingId: string): PgBoss.SendOptions {
  return {
    singletonKey: recordingId,
    retryLimit: settings.retryLimit,
    retryDelay: settings.retryDelaySeconds,
    retryBackoff: true,
    expireInSeconds: settings.expireInSeconds,
    deadLetter: QUEUES.processingFailed,
  };
}

/**
 * Creates the queues (pg-boss `send` to a queue that does not exist returns null and stores
 * nothing) and brings their defaults up to date. Safe to call from every process at every start.
 */
export async function ensureQueues(boss: PgBoss, settings: QueueSettings): Promise<void> {
  // The dead-letter queue first: the processing queue's row refers to it.
  const deadLetters = { retryLimit: 5, retryDelay: 10, retryBackoff: true, expireInSeconds: 5 * 60 };
  await boss.createQueue(QUEUES.processingFailed, { name: QUEUES.processingFailed, ...deadLetters });
  const processing = {
    name: QUEUES.processRecording,
    retryLimit: settings.retryLimit,
    retryDelay: settings.retryDelaySeconds,
    retryBackoff: true,
    expireInSeconds: settings.expireInSeconds,
    deadLetter: QUEUES.processingFailed,
  };
  await boss.createQueue(QUEUES.processRecording, processing);
  await boss.updateQueue(QUEUES.processRecording, processing);
  // A sweep that fails is simply run again at the next hour; no retries pile up behind it.
  await boss.createQueue(QUEUES.cleanUploads, { name: QUEUES.cleanUploads, retryLimit: 0, expireInSeconds: 15 * 60 });
}
