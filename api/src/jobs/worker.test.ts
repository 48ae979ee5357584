import { randomUUID } from 'node:crypto';
import { rm } from 'node:fs/promises';
import { afterAll, afterEach, beforeAll, describe, expect, it } from 'vitest';
import { recordingKeys, recordingPrefix } from '@core/recordings';
import { makeMediaDir, makePdf, makeVideo } from '../../../tests/fixtures/media/generate';
import { buildMember } from '../../test/factories';
import { createTestDatabase, type TestDatabase } from '../../test/test-db';
import { FAILURE_MESSAGES, MediaFailure } from '../processing/media-failure';
import type { ObjectStorage } from '../storage/object-storage';
import { CLEAN_UPLOADS_CRON } from './clean-abandoned-uploads';
import { QUEUES } from './job-queue';
import { buildProcessingRecording, jobsOf, recordingRow, silentLogger, startTestWorker, testStorage, waitFor } from './jobs.test-support';
import { createJobQueue, type PgBossJobQueue } from './pg-boss-queue';
import type { ProcessMedia } from './process-recording';
import type { QueueSettings } from './queue-settings';
import type { RecordingWorker, WorkerOptions } from './start-worker';

describe('the worker, through pg-boss', { timeout: 90_000 }, () => {
  let database: TestDatabase;
  let storage: ObjectStorage;
  let dir: string;
  let video: string;
  const prefixes: string[] = [];
  const running: { queue: PgBossJobQueue; worker: RecordingWorker }[] = [];

  async function start(settings: QueueSettings, options: Partial<WorkerOptions> = {}) {
    const queue = await createJobQueue({
      databaseUrl: database.url,
      db: database.knex,
      settings,
      logger: silentLogger,
      maintenance: true,
      maintenanceIntervalSeconds: 1,
    });
    const worker = await startTestWorker(queue, database.knex, storage, options);
    running.push({ queue, worker });
    return { queue, worker };
  }
  const stored = async (file: string) => {
    const recording = await buildProcessingRecording(database.knex, storage, file);
    prefixes.push(recording.prefix);
    return recording;
  };
  const stateIs = (id: string, state: string) => async () => {
    const row = await recordingRow(database.knex, id);
    return row?.state === state ? row : null;
  };

  beforeAll(async () => {
    database = await createTestDatabase();
    storage = testStorage();
    dir = await makeMediaDir('worker');
    video = await makeVideo({ dir, seconds: 2, width: 320, height: 180, fps: 30, codec: 'h264', audio: true });
  });
  afterEach(async () => {
    for (const { queue, worker } of running.splice(0)) {
      await worker.stop();
      await queue.stop();
    }
  });
  afterAll(async () => {
    for (const prefix of prefixes) await storage.deletePrefix(prefix);
    await database.drop();
    await rm(dir, { recursive: true, force: true });
  });

  it('a queued recording becomes ready, and its job completes', async () => {
    const { queue } = await start({ expireInSeconds: 120, retryLimit: 3, retryDelaySeconds: 1 });
    const recording = await stored(video);
    await database.knex.transaction((trx) => queue.enqueueProcessing(recording.id, { trx }));
    const row = await waitFor(stateIs(recording.id, 'ready'));
    expect(row).toMatchObject({ processing_attempts: 1, progress: 100 });
    const [job] = await waitFor(async () => {
      const jobs = await jobsOf(database.knex, QUEUES.processRecording, recording.id);
      return jobs[0]?.state === 'completed' ? jobs : null;
    });
    expect(job!.output).toMatchObject({ outcome: 'ready' });
  });

  it('a file that can never work is failed at once, without retries, and leaves no objects', async () => {
    const { queue } = await start({ expireInSeconds: 120, retryLimit: 3, retryDelaySeconds: 1 });
    const recording = await stored(await makePdf(dir));
    await queue.enqueueProcessing(recording.id);
    expect(await waitFor(stateIs(recording.id, 'failed'))).toMatchObject({ failure_code: 'not_video', processing_attempts: 1 });
    expect(await storage.listKeys(recording.prefix)).toEqual([]);
    const jobs = await waitFor(async () => {
      const all = await jobsOf(database.knex, QUEUES.processRecording, recording.id);
      return all[0]?.state === 'completed' ? all : null;
    });
    expect(jobs).toHaveLength(1);
  });

  it('a fault that keeps happening is retried, then the recording fails as retryable with its original kept', async () => {
    const failing: ProcessMedia = async () => {
      throw new MediaFailure('processing_error', FAILURE_MESSAGES.processing, true);
    };
    const { queue } = await start({ expireInSeconds: 120, retryLimit: 1, retryDelaySeconds: 1 }, { processMedia: failing });
    const recording = await stored(video);
    // Half-made output of an earlier attempt: it goes when processing gives up.
    await storage.put(recordingKeys.poster(recording.prefix), Buffer.from('half-made poster'), 'image/jpeg');
    await queue.enqueueProcessing(recording.id);
    const row = await waitFor(stateIs(recording.id, 'failed'));
    expect(row).toMatchObject({
      failure_code: 'processing_error',
      failure_message: 'Processing did not succeed after 2 attempts. The original file is kept: press Retry to try again.',
      processing_attempts: 2,
    });
    expect(await storage.listKeys(recording.prefix)).toEqual([recording.originalKey]);
    expect((await jobsOf(database.knex, QUEUES.processRecording, recording.id)).map((j) => j.state)).toEqual(['failed']);
  });

  it('an attempt past the time limit is stopped; after the last one the recording fails as timed out', async () => {
    // Stands in for an ffmpeg that hangs: it ends only when its signal is aborted.
    const hanging: ProcessMedia = ({ signal }) =>
      new Promise((_resolve, reject) => signal?.addEventListener('abort', () => reject(signal.reason as Error), { once: true }));
    const { queue } = await start({ expireInSeconds: 1, retryLimit: 0, retryDelaySeconds: 1 }, { processMedia: hanging });
    const recording = await stored(video);
    await queue.enqueueProcessing(recording.id);
    expect(await waitFor(stateIs(recording.id, 'failed'))).toMatchObject({
      failure_code: 'timed_out',
      failure_message: 'Processing did not finish within the 1-second time limit. The original file is kept: press Retry to try again.',
    });
    expect(await storage.listKeys(recording.prefix)).toEqual([recording.originalKey]);
  });

  it('stopping the worker mid-job aborts ffmpeg and hands the job back; another worker finishes it', async () => {
    let started = false;
    const hanging: ProcessMedia = ({ signal }) => {
      started = true;
      return new Promise((_resolve, reject) => signal?.addEventListener('abort', () => reject(signal.reason as Error), { once: true }));
    };
    const settings = { expireInSeconds: 120, retryLimit: 3, retryDelaySeconds: 1 };
    const first = await start(settings, { processMedia: hanging, shutdownGraceMs: 100 });
    const recording = await stored(video);
    await first.queue.enqueueProcessing(recording.id);
    await waitFor(async () => started);
    await first.worker.stop();
    await first.queue.stop();
    const [job] = await jobsOf(database.knex, QUEUES.processRecording, recording.id);
    expect(job).toMatchObject({ state: 'retry' });
    expect(await recordingRow(database.knex, recording.id)).toMatchObject({ state: 'processing', processing_attempts: 1 });
    expect(await storage.listKeys(recording.prefix)).toEqual([recording.originalKey]);

    await start(settings);
    expect(await waitFor(stateIs(recording.id, 'ready'))).toMatchObject({ processing_attempts: 2 });
  });

  it('schedules the sweep of abandoned uploads hourly, and the sweep aborts an upload idle too long', async () => {
    const { queue } = await start({ expireInSeconds: 120, retryLimit: 3, retryDelaySeconds: 1 });
    const schedules = await queue.boss.getSchedules();
    expect(schedules).toEqual(expect.arrayContaining([expect.objectContaining({ name: QUEUES.cleanUploads, cron: CLEAN_UPLOADS_CRON })]));

    const teacher = await buildMember(database.knex, { roles: ['teacher'] });
    const recordingId = randomUUID();
    const prefix = recordingPrefix(teacher.schoolId, recordingId);
    prefixes.push(prefix);
    const key = recordingKeys.original(prefix);
    const s3UploadId = await storage.createMultipart(key, 'video/mp4');
    const long = new Date(Date.now() - 49 * 3600_000);
    await database.knex('recordings').insert({
      id: recordingId,
      school_id: teacher.schoolId,
      owner_id: teacher.id,
      title: 'Left behind',
      original_file_name: 'Left behind.mp4',
      declared_size: 1000,
      original_key: key,
    });
    const [upload] = await database
      .knex('uploads')
      .insert({
        school_id: teacher.schoolId,
        owner_id: teacher.id,
        recording_id: recordingId,
        object_key: key,
        s3_upload_id: s3UploadId,
        file_name: 'Left behind.mp4',
        declared_type: 'video/mp4',
        declared_size: 1000,
        part_size: 8 * 1024 * 1024,
        part_count: 1,
        file_last_modified: 1_764_000_000_000,
        first_part_sha256: '0'.repeat(64),
        created_at: long,
        last_activity_at: long,
      })
      .returning('id');

    // What the hourly schedule sends.
    await queue.boss.send(QUEUES.cleanUploads, {});
    await waitFor(
      async () =>
        (
          await database
            .knex('uploads')
            .where({ id: (upload as { id: string }).id })
            .first()
        )?.status === 'aborted',
    );
    expect(await recordingRow(database.knex, recordingId)).toBeUndefined();
  });
});
