import { spawn } from 'node:child_process';
import { once } from 'node:events';
import { rm } from 'node:fs/promises';
import { fileURLToPath } from 'node:url';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { recordingKeys } from '@core/recordings';
import { makeMediaDir, makeVideo } from '../../../tests/fixtures/media/generate';
import { createTestDatabase, type TestDatabase } from '../../test/test-db';
import type { ObjectStorage } from '../storage/object-storage';
import { QUEUES } from './job-queue';
import {
  buildProcessingRecording,
  jobsOf,
  recordingRow,
  silentLogger,
  startTestWorker,
  TEST_SETTINGS,
  testStorage,
  waitFor,
} from './jobs.test-support';
import { createJobQueue, type PgBossJobQueue } from './pg-boss-queue';
import type { RecordingWorker } from './start-worker';

const FIXTURE = fileURLToPath(new URL('./worker-death.fixture.ts', import.meta.url));
const ROOT = fileURLToPath(new URL('../../../', import.meta.url));

describe('a worker that dies mid-job', { timeout: 120_000 }, () => {
  let database: TestDatabase;
  let storage: ObjectStorage;
  let dir: string;
  let queue: PgBossJobQueue | undefined;
  let worker: RecordingWorker | undefined;
  let prefix = '';

  beforeAll(async () => {
    database = await createTestDatabase();
    storage = testStorage();
    dir = await makeMediaDir('death');
  });
  afterAll(async () => {
    await worker?.stop();
    await queue?.stop();
    if (prefix) await storage.deletePrefix(prefix);
    await database.drop();
    await rm(dir, { recursive: true, force: true });
  });

  it('leaves its job active; once the job expires pg-boss retries it and another worker completes the recording once', async () => {
    const video = await makeVideo({ dir, seconds: 2, width: 320, height: 180, fps: 30, codec: 'h264', audio: true });
    const recording = await buildProcessingRecording(database.knex, storage, video);
    prefix = recording.prefix;
    const sender = await createJobQueue({
      databaseUrl: database.url,
      db: database.knex,
      settings: TEST_SETTINGS,
      logger: silentLogger,
      maintenance: false,
    });
    await sender.enqueueProcessing(recording.id);
    await sender.stop();

    // A separate process takes the job, then dies without a word to the database.
    const child = spawn(process.execPath, ['--import', 'tsx', FIXTURE], {
      cwd: ROOT,
      env: {
        PATH: process.env.PATH,
        AWS_SDK_JS_NODE_VERSION_SUPPORT_WARNING_DISABLED: 'true',
        // Its work folder outlives it (nothing runs on SIGKILL): keep it in this test's folder.
        TMPDIR: dir,
        DATABASE_URL: database.url,
        S3_ENDPOINT: process.env.S3_ENDPOINT,
        S3_BUCKET: process.env.S3_BUCKET,
        LOG_LEVEL: 'silent',
      },
      stdio: ['ignore', 'pipe', 'inherit'],
    });
    let output = '';
    child.stdout.on('data', (chunk: Buffer) => (output += chunk.toString()));
    await waitFor(async () => output.includes('stalled') || child.exitCode !== null);
    expect(output).toContain('stalled');
    child.kill('SIGKILL');
    await once(child, 'exit');

    const [held] = await jobsOf(database.knex, QUEUES.processRecording, recording.id);
    expect(held).toMatchObject({ state: 'active', retry_count: 0 });
    expect(await recordingRow(database.knex, recording.id)).toMatchObject({ state: 'processing', processing_attempts: 1 });

    // The test cannot wait the real time limit: the job is made to look as old as it.
    await database.knex.raw("UPDATE pgboss.job SET started_on = now() - expire_in - interval '1 second' WHERE id = ?", [held!.id]);

    queue = await createJobQueue({
      databaseUrl: database.url,
      db: database.knex,
      settings: TEST_SETTINGS,
      logger: silentLogger,
      maintenance: true,
      maintenanceIntervalSeconds: 1,
    });
    worker = await startTestWorker(queue, database.knex, storage);

    const ready = await waitFor(async () => {
      const row = await recordingRow(database.knex, recording.id);
      return row?.state === 'ready' ? row : null;
    });
    expect(ready).toMatchObject({ processing_attempts: 2, failure_code: null });
    const jobs = await waitFor(async () => {
      const all = await jobsOf(database.knex, QUEUES.processRecording, recording.id);
      return all[0]?.state === 'completed' ? all : null;
    });
    // One job, retried once (the expired attempt), completed once.
    expect(jobs).toEqual([expect.objectContaining({ id: held!.id, state: 'completed', retry_count: 1 })]);
    expect((await storage.listKeys(recording.prefix)).sort()).toEqual(
      [
        recording.originalKey,
        recordingKeys.poster(recording.prefix),
        recordingKeys.rendition(recording.prefix),
        recordingKeys.thumbnailSheet(recording.prefix, 0),
      ].sort(),
    );
  });
});
