import type { Knex } from 'knex';
import PgBoss from 'pg-boss';
import type { Logger } from 'pino';
import { QUEUES, type JobQueue, type ProcessRecordingJob } from './job-queue';
import { knexExecutor } from './knex-executor';
import { ensureQueues, JOB_SCHEMA, processingJobOptions, type QueueSettings } from './queue-settings';

/** The job queue of this process: the API enqueues through it, the worker takes jobs from `boss`. */
export interface PgBossJobQueue extends JobQueue {
  readonly boss: PgBoss;
  readonly settings: QueueSettings;
}

export interface JobQueueOptions {
  databaseUrl: string;
  /** The app's Knex: an enqueue without a transaction of the caller's runs in one of its own. */
  db: Knex;
  settings: QueueSettings;
  logger: Logger;
  /** Expire stuck jobs, archive old ones and fire schedules: on in processes that run a worker. */
  maintenance: boolean;
  /** Tests shorten these; production keeps pg-boss's defaults (120 s maintenance, 2 s polling). */
  maintenanceIntervalSeconds?: number;
}

/** A pg-boss instance that only builds SQL and sends it through Knex: no pool, nothing to start. */
export function sqlOnlyBoss(db: Knex | Knex.Transaction): PgBoss {
  return new PgBoss({ db: knexExecutor(db), schema: JOB_SCHEMA });
}

/**
 * Queues processing of a recording inside `trx`. A recording with a job still queued, waiting to
 * retry or running gets no second one: pg-boss's singletonKey alone does not promise that for
 * active jobs, so the check runs here, serialised per recording by an advisory lock.
 * Returns the job id, or null when one was already open.
 */
export async function enqueueProcessingIn(trx: Knex.Transaction, settings: QueueSettings, recordingId: string): Promise<string | null> {
  await trx.raw('SELECT pg_advisory_xact_lock(hashtext(?), hashtext(?))', [QUEUES.processRecording, recordingId]);
  const open = await trx.raw<{ rows: { id: string }[] }>(
    `SELECT id FROM ${JOB_SCHEMA}.job WHERE name = ? AND singleton_key = ? AND state < 'completed' LIMIT 1`,
    [QUEUES.processRecording, recordingId],
  );
  if (open.rows.length > 0) return null;
  const data: ProcessRecordingJob = { recordingId };
  const id = await sqlOnlyBoss(trx).send(QUEUES.processRecording, data, processingJobOptions(settings, recordingId));
  // pg-boss stores nothing and says null when the queue is missing: that must not pass silently.
  if (!id) throw new Error(`The job queue "${QUEUES.processRecording}" does not exist: start the app or worker once to create it.`);
  return id;
}

function explainStartFailure(error: unknown): Error {
  const message = (error as Error).message ?? String(error);
  if (/not installed|requires migrations/.test(message)) {
    return new Error(`The job queue tables are missing or out of date (${message}): run the migrations (npm run db:migrate).`);
  }
  return error instanceof Error ? error : new Error(message);
}

/**
 * Starts pg-boss on the app's PostgreSQL (schema installed by the Knex migration; `migrate: false`
 * so a start never changes it) and creates the queues.
 */
export async function createJobQueue(options: JobQueueOptions): Promise<PgBossJobQueue> {
  const { db, settings, logger } = options;
  const boss = new PgBoss({
    connectionString: options.databaseUrl,
    schema: JOB_SCHEMA,
    application_name: 'pinfield-jobs',
    max: 4,
    migrate: false,
    supervise: options.maintenance,
    schedule: options.maintenance,
    ...(options.maintenanceIntervalSeconds ? { maintenanceIntervalSeconds: options.maintenanceIntervalSeconds } : {}),
  });
  // Without a listener an 'error' event would end the process; these are connection hiccups it retries.
  boss.on('error', (error) => logger.error({ err: error }, 'job queue error'));
  try {
    await boss.start();
  } catch (error) {
    throw explainStartFailure(error);
  }
  await ensureQueues(boss, settings);

  let stopped = false;
  return {
    boss,
    settings,
    async enqueueProcessing(recordingId, { trx } = {}) {
      if (stopped) throw new Error('The job queue has stopped: this process is shutting down.');
      const id = trx
        ? await enqueueProcessingIn(trx, settings, recordingId)
        : await db.transaction((own) => enqueueProcessingIn(own, settings, recordingId));
      logger.debug({ recordingId, jobId: id }, id ? 'processing queued' : 'processing already queued');
    },
    async stop() {
      if (stopped) return;
      stopped = true;
      // The worker has already let its job finish or given it back; nothing active is left to wait for.
      await boss.stop({ graceful: true, timeout: 1000 });
    },
  };
}

/**
 * A JobQueue for work that runs inside one outer transaction and no running pg-boss (the demo
 * seed): queues are created and jobs written through that transaction, so they commit with it.
 */
export async function transactionJobQueue(outer: Knex.Transaction, settings: QueueSettings): Promise<JobQueue> {
  await ensureQueues(sqlOnlyBoss(outer), settings);
  let stopped = false;
  return {
    async enqueueProcessing(recordingId, { trx } = {}) {
      if (stopped) throw new Error('This job queue was stopped: its transaction is over.');
      await enqueueProcessingIn(trx ?? outer, settings, recordingId);
    },
    async stop() {
      stopped = true;
    },
  };
}
