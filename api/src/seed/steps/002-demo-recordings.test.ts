import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { createTestDatabase, type TestDatabase } from '../../../test/test-db';
import { QUEUES } from '../../jobs/job-queue';
import { recordingRow, silentLogger, startTestWorker, TEST_SETTINGS, testStorage, waitFor } from '../../jobs/jobs.test-support';
import { createJobQueue } from '../../jobs/pg-boss-queue';
import type { ObjectStorage } from '../../storage/object-storage';
import { seedPeopleAndClasses } from './001-people-and-classes';
import { seedDemoRecordings } from './002-demo-recordings';

describe('seed step 002: demo recordings through the upload pipeline', { timeout: 180_000 }, () => {
  let database: TestDatabase;
  let storage: ObjectStorage;
  const s3 = { NODE_ENV: 'test', S3_ENDPOINT: process.env.S3_ENDPOINT, S3_BUCKET: process.env.S3_BUCKET };

  beforeAll(async () => {
    database = await createTestDatabase();
    storage = testStorage();
  });
  afterAll(async () => {
    for (const { id } of await database.knex('schools').select<{ id: string }[]>('id')) await storage.deletePrefix(`schools/${id}/`);
    await database.drop();
  });

  it('says what is missing and keeps nothing when storage cannot be reached', async () => {
    const attempt = database.knex.transaction(async (trx) => {
      await seedPeopleAndClasses(trx);
      await seedDemoRecordings(trx, { ...s3, S3_ENDPOINT: 'http://127.0.0.1:9' });
    });
    await expect(attempt).rejects.toThrow(
      /^The demo recordings need the S3 storage at http:\/\/127\.0\.0\.1:9 \(npm start runs a local one before seeding\)/,
    );
    expect(await database.knex('recordings').count<{ count: number }[]>('* as count')).toEqual([{ count: 0 }]);
  });

  it("uploads three recordings as Ada Quillfeather's, queues them in the seed's transaction, and a worker makes them ready", async () => {
    await database.knex.transaction(async (trx) => {
      await seedPeopleAndClasses(trx);
      await seedDemoRecordings(trx, s3);
    });

    const ada = await database.knex('users').where({ email: 'ada.quillfeather@fernhollow.example' }).first<{ id: string }>('id');
    const rows = await database.knex('recordings').orderBy('title').select<Record<string, unknown>[]>('*');
    expect(rows.map((r) => r.title)).toEqual([
      'Demo: current balance',
      'Demo: magnet through a copper tube',
      'Demo: pendulum timing (phone, portrait)',
    ]);
    for (const row of rows) {
      expect(row).toMatchObject({ owner_id: ada.id, state: 'processing' });
      // The multipart upload was completed in storage, and the size checked against the declared one.
      expect(await storage.head(row.original_key as string)).toMatchObject({ size: row.stored_size });
      expect(row.stored_size).toBe(row.declared_size);
    }
    const uploads = await database.knex('uploads').select('status', 'recording_id');
    expect(uploads.map((u) => u.status)).toEqual(['completed', 'completed', 'completed']);
    const jobs = await database.knex.raw<{ rows: { state: string }[] }>('SELECT state FROM pgboss.job WHERE name = ?', [
      QUEUES.processRecording,
    ]);
    expect(jobs.rows.map((j) => j.state)).toEqual(['created', 'created', 'created']);

    const captions = await database
      .knex('recording_captions')
      .orderBy(['language'])
      .select('recording_id', 'language', 'is_default', 'cue_count', 'vtt');
    expect(captions.filter((c) => c.language === 'en')).toHaveLength(3);
    expect(captions.filter((c) => c.is_default).map((c) => c.language)).toEqual(['en', 'en', 'en']);
    expect(captions.find((c) => c.language === 'fr')).toMatchObject({ is_default: false, cue_count: 3 });
    for (const caption of captions) expect(caption.vtt).toMatch(/^WEBVTT\n\n1\n00:00:00\.000 --> /);

    // What npm start's in-process worker does next.
    const queue = await createJobQueue({
      databaseUrl: database.url,
      db: database.knex,
      settings: TEST_SETTINGS,
      logger: silentLogger,
      maintenance: false,
    });
    const worker = await startTestWorker(queue, database.knex, storage);
    try {
      for (const row of rows) await waitFor(async () => (await recordingRow(database.knex, row.id as string))?.state !== 'processing');
    } finally {
      await worker.stop();
      await queue.stop();
    }
    const done = await database
      .knex('recordings')
      .orderBy('title')
      .select('title', 'state', 'width', 'height', 'duration_seconds', 'audio_codec', 'poster_key');
    expect(done.map((r) => r.state)).toEqual(['ready', 'ready', 'ready']);
    expect(done.map((r) => [r.width, r.height])).toEqual([
      [1280, 720],
      [1280, 720],
      [720, 1280],
    ]);
    expect(done.map((r) => Math.round(r.duration_seconds))).toEqual([8, 10, 12]);
    for (const row of done) {
      expect(row.audio_codec).toBe('aac');
      expect(await storage.head(row.poster_key)).toMatchObject({ contentType: 'image/jpeg' });
    }
  });
});
