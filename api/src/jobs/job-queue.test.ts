import { randomUUID } from 'node:crypto';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { createEmptyDatabase, createTestDatabase, type TestDatabase } from '../../test/test-db';
import { migrate } from '../db/migrator';
import { QUEUES } from './job-queue';
import { createJobQueue, enqueueProcessingIn, type PgBossJobQueue } from './pg-boss-queue';
import { JOB_SCHEMA, queueSettingsFromEnv } from './queue-settings';
import { jobsOf, silentLogger, TEST_SETTINGS } from './jobs.test-support';

describe('the job queue', () => {
  let database: TestDatabase;
  let queue: PgBossJobQueue;
  const recordingId = () => randomUUID();

  beforeAll(async () => {
    database = await createTestDatabase();
    queue = await createJobQueue({
      databaseUrl: database.url,
      db: database.knex,
      settings: TEST_SETTINGS,
      logger: silentLogger,
      maintenance: false,
    });
  });
  afterAll(async () => {
    await queue.stop();
    await database.drop();
  });

  it('runs on the schema the Knex migration installed, at the version this pg-boss expects', async () => {
    // Source: pg-boss 10.4.2 version.json ("schema": 24), the version its construction plan writes.
    expect(await queue.boss.schemaVersion()).toBe(24);
    const names = (await queue.boss.getQueues()).map((q) => q.name);
    expect(names).toEqual(expect.arrayContaining([QUEUES.processRecording, QUEUES.processingFailed, QUEUES.cleanUploads]));
  });

  it('a processing job carries the recording as its singleton key, the retry settings and the time limit', async () => {
    const id = recordingId();
    await queue.enqueueProcessing(id);
    const [job] = await jobsOf(database.knex, QUEUES.processRecording, id);
    const full = await queue.boss.getJobById<{ recordingId: string }>(QUEUES.processRecording, job!.id);
    expect(full).toMatchObject({
      data: { recordingId: id },
      singletonKey: id,
      retryLimit: TEST_SETTINGS.retryLimit,
      retryDelay: TEST_SETTINGS.retryDelaySeconds,
      retryBackoff: true,
      deadLetter: QUEUES.processingFailed,
      state: 'created',
    });
    expect(Number(full!.expireInSeconds)).toBe(TEST_SETTINGS.expireInSeconds);
  });

  it('a job queued in a transaction that rolls back was never queued', async () => {
    const id = recordingId();
    await expect(
      database.knex.transaction(async (trx) => {
        await queue.enqueueProcessing(id, { trx });
        expect(await jobsOf(trx, QUEUES.processRecording, id)).toHaveLength(1);
        throw new Error('the completion failed after queuing');
      }),
    ).rejects.toThrow('the completion failed after queuing');
    expect(await jobsOf(database.knex, QUEUES.processRecording, id)).toEqual([]);
  });

  it('a job queued in a transaction that commits is there once it commits', async () => {
    const id = recordingId();
    await database.knex.transaction((trx) => queue.enqueueProcessing(id, { trx }));
    expect(await jobsOf(database.knex, QUEUES.processRecording, id)).toMatchObject([{ state: 'created', singleton_key: id }]);
  });

  it('queuing a recording again while its job is queued or running adds nothing; after it finished, it does', async () => {
    const id = recordingId();
    await queue.enqueueProcessing(id);
    await queue.enqueueProcessing(id);
    await database.knex.transaction((trx) => queue.enqueueProcessing(id, { trx }));
    expect(await jobsOf(database.knex, QUEUES.processRecording, id)).toHaveLength(1);

    // A worker takes it: active, and still the only one.
    const taken = await takeJobOf(id);
    expect(await jobsOf(database.knex, QUEUES.processRecording, id)).toMatchObject([{ state: 'active' }]);
    await queue.enqueueProcessing(id);
    expect(await jobsOf(database.knex, QUEUES.processRecording, id)).toHaveLength(1);

    // Done (say, failed for good and the teacher pressed Retry): a new job is queued.
    await queue.boss.complete(QUEUES.processRecording, taken);
    await queue.enqueueProcessing(id);
    expect((await jobsOf(database.knex, QUEUES.processRecording, id)).map((j) => j.state)).toEqual(['completed', 'created']);
  });

  it('two transactions queuing the same recording at once make one job', async () => {
    const id = recordingId();
    await Promise.all([
      database.knex.transaction((trx) => queue.enqueueProcessing(id, { trx })),
      database.knex.transaction((trx) => queue.enqueueProcessing(id, { trx })),
    ]);
    expect(await jobsOf(database.knex, QUEUES.processRecording, id)).toHaveLength(1);
  });

  it('refuses to queue into a queue that was never created, instead of storing nothing', async () => {
    const bare = await createTestDatabase();
    try {
      await expect(bare.knex.transaction((trx) => enqueueProcessingIn(trx, TEST_SETTINGS, recordingId()))).rejects.toThrow(
        'The job queue "process-recording" does not exist',
      );
    } finally {
      await bare.drop();
    }
  });

  it('says to run the migrations when the job tables are missing, and starting never installs them itself', async () => {
    const empty = await createEmptyDatabase();
    const db = (await import('../db/knex')).createKnex(empty.url, { min: 0, max: 1 });
    try {
      await expect(
        createJobQueue({ databaseUrl: empty.url, db, settings: TEST_SETTINGS, logger: silentLogger, maintenance: false }),
      ).rejects.toThrow(/job queue tables are missing or out of date .*run the migrations/);
      const schema = await db.raw<{ rows: unknown[] }>('SELECT 1 FROM information_schema.schemata WHERE schema_name = ?', [JOB_SCHEMA]);
      expect(schema.rows).toEqual([]);
      // The migration installs them; a second run of it (Knex lost its record) changes nothing.
      await migrate(empty.url, 'latest');
      const migration = await import('../../../migrations/20261202090100_install-job-queue');
      await expect(migration.up(db)).resolves.toBeUndefined();
      const started = await createJobQueue({
        databaseUrl: empty.url,
        db,
        settings: TEST_SETTINGS,
        logger: silentLogger,
        maintenance: false,
      });
      expect(await started.boss.schemaVersion()).toBe(24);
      await started.stop();
    } finally {
      await db.destroy();
      await empty.drop();
    }
  });

  it('takes the time limit from PROCESSING_TIMEOUT_MINUTES and refuses one pg-boss cannot hold', () => {
    expect(queueSettingsFromEnv({ PROCESSING_TIMEOUT_MINUTES: 60 })).toEqual({
      expireInSeconds: 3600,
      retryLimit: 3,
      retryDelaySeconds: 30,
    });
    // Source: pg-boss 10.4.2 src/attorney.js, POLICY.MAX_EXPIRATION_HOURS = 24 ("expiration cannot exceed 24 hours").
    expect(() => queueSettingsFromEnv({ PROCESSING_TIMEOUT_MINUTES: 24 * 60 })).toThrow(
      'PROCESSING_TIMEOUT_MINUTES: expected at most 1439 minutes',
    );
  });

  /** What a worker does first: fetch, which makes the job active. */
  async function takeJobOf(id: string): Promise<string> {
    const jobs = await queue.boss.fetch<{ recordingId: string }>(QUEUES.processRecording, { batchSize: 100 });
    const job = jobs.find((j) => j.data.recordingId === id);
    if (!job) throw new Error(`no queued job for ${id}`);
    return job.id;
  }
});
