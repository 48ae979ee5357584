import { setTimeout as sleep } from 'node:timers/promises';
import type { Knex } from 'knex';
import type { Logger } from 'pino';
import type { ObjectStorage } from '../storage/object-storage';
import { processMedia as realProcessMedia } from '../processing/process-media';
import { DeadlineAbort, ShutdownAbort } from './attempt-failed';
import { CLEAN_UPLOADS_CRON, cleanAbandonedUploads } from './clean-abandoned-uploads';
import { QUEUES, type ProcessRecordingJob } from './job-queue';
import type { PgBossJobQueue } from './pg-boss-queue';
import { processRecording, type ProcessMedia, type ProcessingOutcome } from './process-recording';
import { markProcessingGaveUp } from './processing-gave-up';
import { removeStaleTempFolders } from './temp-folders';
import { startRollupLoop } from '../features/rollups/rollup-loop';

export interface WorkerOptions {
  queue: PgBossJobQueue;
  db: Knex;
  storage: ObjectStorage;
  logger: Logger;
  /** FFMPEG_NICE. */
  nice: number;
  /** UPLOAD_ABANDON_HOURS. */
  uploadAbandonHours: number;
  /** Tests pass a stand-in that stalls; everything else uses the real ffmpeg pipeline. */
  processMedia?: ProcessMedia;
  /** How often an idle worker looks for a job; pg-boss's default is 2 s. */
  pollingIntervalSeconds?: number;
  /** On stop, how long the running job may still finish before ffmpeg is aborted. */
  shutdownGraceMs?: number;
  /** How often the rollups for results are brought up to date (default 5 s). */
  rollupIntervalMs?: number;
}

export interface RecordingWorker {
  /**
   * Stops taking jobs, lets the running one finish for up to `shutdownGraceMs`, then aborts its
   * ffmpeg: the aborted attempt fails and pg-boss retries it after the retry delay, on this worker
   * or another. (Waiting for the end of a long transcode would outlast any supervisor's patience;
   * the retry redoes the work from the original, which is always kept until the recording is ready.)
   */
  stop(): Promise<void>;
}

/** The default grace: `npm start` and most supervisors send SIGKILL 10 s after SIGTERM. */
const SHUTDOWN_GRACE_MS = 5000;

/**
 * Runs the queues' handlers in this process: recordings one at a time (one pg-boss worker, batch
 * size 1, so a single ffmpeg runs at a time), dead letters, the hourly sweep of abandoned uploads, and
 * the rollup loop that keeps the results pages' rollups (features/rollups).
 */
export async function startWorker(options: WorkerOptions): Promise<RecordingWorker> {
  const { queue, db, storage, logger } = options;
  const { boss, settings } = queue;
  let stopRequested = false;
  const ctx = {
    db,
    storage,
    logger,
    processMedia: options.processMedia ?? realProcessMedia,
    nice: options.nice,
    isStopping: () => stopRequested,
  };
  const polling = options.pollingIntervalSeconds ? { pollingIntervalSeconds: options.pollingIntervalSeconds } : {};
  let current: { controller: AbortController; settled: Promise<void> } | null = null;

  const staleFolders = await removeStaleTempFolders(2 * settings.expireInSeconds * 1000);
  if (staleFolders > 0) logger.info({ removed: staleFolders }, 'removed work folders left by a stopped worker');

  await boss.work<ProcessRecordingJob>(
    QUEUES.processRecording,
    { batchSize: 1, ...polling },
    async ([job]): Promise<ProcessingOutcome | null> => {
      if (!job) return null;
      const controller = new AbortController();
      // pg-boss fails the job at its expiry; ffmpeg must not keep running (and writing) past it.
      const seconds = Number(job.expireInSeconds);
      const deadline = setTimeout(() => controller.abort(new DeadlineAbort(seconds)), seconds * 1000);
      const run = processRecording(ctx, job.data.recordingId, controller.signal);
      current = {
        controller,
        settled: run.then(
          () => undefined,
          () => undefined,
        ),
      };
      try {
        const outcome = await run;
        if (outcome.outcome === 'skipped') logger.info({ recordingId: job.data.recordingId, reason: outcome.reason }, 'processing skipped');
        return outcome;
      } finally {
        clearTimeout(deadline);
        current = null;
      }
    },
  );

  await boss.work<ProcessRecordingJob>(QUEUES.processingFailed, { batchSize: 1, includeMetadata: true, ...polling }, async ([job]) => {
    if (!job) return null;
    return markProcessingGaveUp({ db, storage, logger, settings }, job.data.recordingId, job.output);
  });

  await boss.work(QUEUES.cleanUploads, { batchSize: 1, ...polling }, () =>
    cleanAbandonedUploads({ db, storage, logger, olderThanHours: options.uploadAbandonHours }),
  );
  await boss.schedule(QUEUES.cleanUploads, CLEAN_UPLOADS_CRON, {}, { tz: 'UTC' });
  const rollups = startRollupLoop({ db, logger, ...(options.rollupIntervalMs ? { intervalMs: options.rollupIntervalMs } : {}) });

  logger.info(
    { nice: options.nice, timeoutMinutes: settings.expireInSeconds / 60, retries: settings.retryLimit },
    'worker started: processing one recording at a time; abandoned uploads swept hourly',
  );

  let stopping: Promise<void> | null = null;
  return {
    stop() {
      stopRequested = true;
      stopping ??= (async () => {
        await Promise.all([
          boss.offWork(QUEUES.processRecording),
          boss.offWork(QUEUES.processingFailed),
          boss.offWork(QUEUES.cleanUploads),
          rollups.stop(),
        ]);
        const running = current;
        if (running) {
          const grace = options.shutdownGraceMs ?? SHUTDOWN_GRACE_MS;
          const finished = await Promise.race([running.settled.then(() => true), sleep(grace, false, { ref: false })]);
          if (!finished) {
            logger.info('worker stopping: aborting the running recording; the job queue retries it');
            running.controller.abort(new ShutdownAbort());
            // ffmpeg dies at once; a storage call in flight may not. Past this, stopping the queue fails the job back.
            const ended = await Promise.race([running.settled.then(() => true), sleep(grace, false, { ref: false })]);
            if (!ended)
              logger.warn('worker stopping: the aborted attempt did not end in time; stopping the queue hands its job back for a retry');
          }
        }
        logger.info('worker stopped');
      })();
      return stopping;
    },
  };
}
