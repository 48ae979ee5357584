import { randomUUID } from 'node:crypto';
import { readFile } from 'node:fs/promises';
import { setTimeout as sleep } from 'node:timers/promises';
import type { Knex } from 'knex';
import { recordingKeys, recordingPrefix } from '@core/recordings';
import { loadEnv } from '../env';
import { createLogger } from '../logger';
import { createObjectStorage, storageConfigFromEnv, type ObjectStorage } from '../storage/object-storage';
import { buildMember } from '../../test/factories';
import type { QueueSettings } from './queue-settings';
import type { PgBossJobQueue } from './pg-boss-queue';
import { startWorker, type RecordingWorker, type WorkerOptions } from './start-worker';

export const silentLogger = createLogger('silent');

/** Short retry delays so a test sees retries without waiting minutes; the limits are production's. */
export const TEST_SETTINGS: QueueSettings = { expireInSeconds: 600, retryLimit: 3, retryDelaySeconds: 1 };

/** The S3 fake the API tests run against (its address comes from the test command's environment). */
export function testStorage(): ObjectStorage {
  const env = loadEnv({ NODE_ENV: 'test', S3_ENDPOINT: process.env.S3_ENDPOINT, S3_BUCKET: process.env.S3_BUCKET });
  return createObjectStorage(storageConfigFromEnv(env));
}

export interface StoredRecording {
  id: string;
  schoolId: string;
  ownerId: string;
  prefix: string;
  originalKey: string;
}

/**
 * A recording whose upload has completed: the original is in storage and the row is `processing`,
 * as the uploads service leaves it right before it queues the job.
 */
export async function buildProcessingRecording(
  db: Knex,
  storage: ObjectStorage,
  filePath: string,
  title = 'Falling magnet',
): Promise<StoredRecording> {
  const teacher = await buildMember(db, { roles: ['teacher'] });
  const id = randomUUID();
  const prefix = recordingPrefix(teacher.schoolId, id);
  const originalKey = recordingKeys.original(prefix);
  const bytes = await readFile(filePath);
  await storage.put(originalKey, bytes, 'video/mp4', bytes.length);
  await db('recordings').insert({
    id,
    school_id: teacher.schoolId,
    owner_id: teacher.id,
    title,
    original_file_name: `${title}.mp4`,
    state: 'processing',
    declared_size: bytes.length,
    stored_size: bytes.length,
    original_key: originalKey,
  });
  return { id, schoolId: teacher.schoolId, ownerId: teacher.id, prefix, originalKey };
}

/** Polls until `check` returns something truthy; the test's own timeout bounds the wait. */
export async function waitFor<T>(check: () => Promise<T | null | undefined | false>, intervalMs = 200): Promise<T> {
  for (;;) {
    const value = await check();
    if (value) return value;
    await sleep(intervalMs);
  }
}

export async function recordingRow(db: Knex, id: string) {
  return db('recordings').where({ id }).first();
}

/** The pg-boss jobs of a queue for one recording, oldest first. */
export async function jobsOf(db: Knex, queue: string, recordingId: string) {
  const result = await db.raw<{
    rows: { id: string; state: string; retry_count: number; output: unknown; singleton_key: string | null }[];
  }>(
    "SELECT id, state, retry_count, output, singleton_key FROM pgboss.job WHERE name = ? AND data->>'recordingId' = ? ORDER BY created_on",
    [queue, recordingId],
  );
  return result.rows;
}

/** A worker on the test database and storage that polls twice a second, as the tests need. */
export function startTestWorker(
  queue: PgBossJobQueue,
  db: Knex,
  storage: ObjectStorage,
  options: Partial<WorkerOptions> = {},
): Promise<RecordingWorker> {
  return startWorker({
    queue,
    db,
    storage,
    logger: silentLogger,
    nice: 10,
    uploadAbandonHours: 48,
    pollingIntervalSeconds: 0.5,
    ...options,
  });
}
