import { access, rm } from 'node:fs/promises';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { recordingKeys } from '@core/recordings';
import { makeMediaDir, makePdf, makeTruncated, makeVideo } from '../../../tests/fixtures/media/generate';
import { createTestDatabase, type TestDatabase } from '../../test/test-db';
import { FAILURE_MESSAGES, MediaFailure } from '../processing/media-failure';
import { processMedia } from '../processing/process-media';
import type { ObjectStorage } from '../storage/object-storage';
import { AttemptFailedError, DeadlineAbort } from './attempt-failed';
import { buildProcessingRecording, recordingRow, silentLogger, testStorage, waitFor } from './jobs.test-support';
import { processRecording, type ProcessingContext, type ProcessMedia } from './process-recording';

describe('processing one recording (the process-recording handler)', { timeout: 60_000 }, () => {
  let database: TestDatabase;
  let storage: ObjectStorage;
  let dir: string;
  let video: string;
  const prefixes: string[] = [];

  const ctx = (overrides: Partial<ProcessingContext> = {}): ProcessingContext => ({
    db: database.knex,
    storage,
    logger: silentLogger,
    processMedia,
    nice: 10,
    ...overrides,
  });
  const stored = async (file: string) => {
    const recording = await buildProcessingRecording(database.knex, storage, file);
    prefixes.push(recording.prefix);
    return recording;
  };
  const run = (recordingId: string, overrides: Partial<ProcessingContext> = {}, signal = new AbortController().signal) =>
    processRecording(ctx(overrides), recordingId, signal);

  beforeAll(async () => {
    database = await createTestDatabase();
    storage = testStorage();
    dir = await makeMediaDir('jobs');
    video = await makeVideo({ dir, seconds: 3, width: 640, height: 360, fps: 30, codec: 'h264', audio: true });
  });
  afterAll(async () => {
    for (const prefix of prefixes) await storage.deletePrefix(prefix);
    await database.drop();
    await rm(dir, { recursive: true, force: true });
  });

  it('makes a recording ready: poster, sheets and rendition under their fixed keys, facts in one row', async () => {
    const recording = await stored(video);
    await expect(run(recording.id)).resolves.toMatchObject({ outcome: 'ready' });

    const row = await recordingRow(database.knex, recording.id);
    expect(row).toMatchObject({
      state: 'ready',
      progress: 100,
      failure_code: null,
      content_type: 'video/mp4',
      poster_key: recordingKeys.poster(recording.prefix),
      rendition_key: recordingKeys.rendition(recording.prefix),
      width: 640,
      height: 360,
      video_codec: 'h264',
      audio_codec: 'aac',
      rotation: 0,
      processing_attempts: 1,
    });
    expect(['transcode', 'remux']).toContain(row.rendition_mode);
    expect(row.duration_seconds).toBeCloseTo(3, 0);
    expect(row.frame_rate).toBeCloseTo(30, 0);
    expect(row.processed_at).toBeInstanceOf(Date);
    expect(row.thumbnails).toMatchObject({ sheets: [{ key: recordingKeys.thumbnailSheet(recording.prefix, 0) }] });
    expect(row.thumbnails.intervalSeconds).toBeGreaterThan(0);
    expect(row.thumbnails.sheets[0].tiles).toBeGreaterThan(0);

    const keys = (await storage.listKeys(recording.prefix)).sort();
    expect(keys).toEqual(
      [
        recording.originalKey,
        recordingKeys.poster(recording.prefix),
        recordingKeys.rendition(recording.prefix),
        recordingKeys.thumbnailSheet(recording.prefix, 0),
      ].sort(),
    );
    expect(await storage.head(recordingKeys.poster(recording.prefix))).toMatchObject({ contentType: 'image/jpeg' });
    expect(await storage.head(recordingKeys.thumbnailSheet(recording.prefix, 0))).toMatchObject({ contentType: 'image/jpeg' });
    const rendition = await storage.head(recordingKeys.rendition(recording.prefix));
    expect(rendition).toMatchObject({ contentType: 'video/mp4' });
    expect(rendition!.size).toBeGreaterThan(0);
  });

  it('run twice for one recording: the same keys and the same row, nothing added; sheets of a longer attempt go', async () => {
    const recording = await stored(video);
    await run(recording.id);
    const keysAfterFirst = (await storage.listKeys(recording.prefix)).sort();
    const rowsBefore = await database.knex('recordings').count<{ count: number }[]>('* as count');
    // As if an earlier attempt (of a longer probe) had stored more sheets than this one makes.
    const leftover = recordingKeys.thumbnailSheet(recording.prefix, 4);
    await storage.put(leftover, Buffer.from('old sheet'), 'image/jpeg');
    // A retry of a job whose first attempt already finished (the worker died before pg-boss heard).
    await database.knex('recordings').where({ id: recording.id }).update({ state: 'processing' });

    await expect(run(recording.id)).resolves.toMatchObject({ outcome: 'ready' });

    expect((await storage.listKeys(recording.prefix)).sort()).toEqual(keysAfterFirst);
    expect(await database.knex('recordings').count<{ count: number }[]>('* as count')).toEqual(rowsBefore);
    expect(await recordingRow(database.knex, recording.id)).toMatchObject({ state: 'ready', processing_attempts: 2 });
  });

  it('a PDF ends failed with its reason, and every object of it is deleted (the row stays to say why)', async () => {
    const recording = await stored(await makePdf(dir));
    await expect(run(recording.id)).resolves.toEqual({ outcome: 'failed', code: 'not_video' });
    expect(await recordingRow(database.knex, recording.id)).toMatchObject({
      state: 'failed',
      failure_code: 'not_video',
      failure_message: 'This file is a PDF, not a video.',
      poster_key: null,
      rendition_key: null,
    });
    expect(await storage.listKeys(recording.prefix)).toEqual([]);
  });

  it('a file cut short ends failed "truncated" with no objects left', async () => {
    const longer = await makeVideo({
      dir,
      name: 'longer.mp4',
      seconds: 6,
      width: 320,
      height: 180,
      fps: 30,
      codec: 'h264',
      audio: true,
      faststart: true,
    });
    const recording = await stored(await makeTruncated(longer, { keepFraction: 0.5 }));
    await expect(run(recording.id)).resolves.toEqual({ outcome: 'failed', code: 'truncated' });
    const row = await recordingRow(database.knex, recording.id);
    expect(row).toMatchObject({ state: 'failed', failure_code: 'truncated' });
    expect(row.failure_message).toMatch(
      /^The file stops early at 00:0\d — it may not have finished copying from the phone\.$|^The file is incomplete/,
    );
    expect(await storage.listKeys(recording.prefix)).toEqual([]);
  });

  it('a fault that may pass is thrown for pg-boss to retry: the row stays processing, the original stays', async () => {
    const recording = await stored(video);
    const flaky: ProcessMedia = async () => {
      throw new MediaFailure('processing_error', FAILURE_MESSAGES.processing, true);
    };
    const attempt = run(recording.id, { processMedia: flaky });
    await expect(attempt).rejects.toBeInstanceOf(AttemptFailedError);
    await expect(attempt).rejects.toMatchObject({ failureCode: 'processing_error' });
    expect(await recordingRow(database.knex, recording.id)).toMatchObject({
      state: 'processing',
      processing_attempts: 1,
      failure_code: null,
    });
    expect(await storage.listKeys(recording.prefix)).toEqual([recording.originalKey]);
  });

  it('an attempt past its deadline stops ffmpeg and is thrown as timed out, keeping the original', async () => {
    const recording = await stored(video);
    const controller = new AbortController();
    // The deadline fires as soon as ffmpeg reports: a real abort of a real ffmpeg run.
    const slow: ProcessMedia = (options) => processMedia({ ...options, onProgress: () => controller.abort(new DeadlineAbort(1)) });
    await expect(run(recording.id, { processMedia: slow }, controller.signal)).rejects.toMatchObject({ failureCode: 'timed_out' });
    expect(await recordingRow(database.knex, recording.id)).toMatchObject({ state: 'processing' });
    expect(await storage.listKeys(recording.prefix)).toEqual([recording.originalKey]);
  });

  it('while the worker stops, even a "bad file" error is not believed: the original stays for the retry', async () => {
    const recording = await stored(video);
    // What a killed ffprobe looks like from the outside.
    const killed: ProcessMedia = async () => {
      throw new MediaFailure('unreadable', FAILURE_MESSAGES.unreadable, false);
    };
    await expect(run(recording.id, { processMedia: killed, isStopping: () => true })).rejects.toMatchObject({
      failureCode: 'processing_error',
    });
    expect(await recordingRow(database.knex, recording.id)).toMatchObject({ state: 'processing' });
    expect(await storage.listKeys(recording.prefix)).toEqual([recording.originalKey]);
  });

  it('skips a recording that is gone or no longer waiting for processing', async () => {
    await expect(run('8d1d7a52-38d3-4f8e-9a55-1f2f0f6c2b11')).resolves.toEqual({ outcome: 'skipped', reason: 'the recording was deleted' });
    const recording = await stored(video);
    await database.knex('recordings').where({ id: recording.id }).update({ state: 'ready' });
    await expect(run(recording.id)).resolves.toEqual({ outcome: 'skipped', reason: 'the recording is ready' });
    expect(await recordingRow(database.knex, recording.id)).toMatchObject({ processing_attempts: 0 });
  });

  it('a recording deleted while ffmpeg runs leaves no objects behind', async () => {
    const recording = await stored(video);
    // The teacher deletes it mid-way: the delete route removes the objects it sees and the row.
    const deleting: ProcessMedia = async (options) => {
      const media = await processMedia(options);
      await storage.deletePrefix(recording.prefix);
      await database.knex('recordings').where({ id: recording.id }).delete();
      return media;
    };
    await expect(run(recording.id, { processMedia: deleting })).resolves.toMatchObject({ outcome: 'skipped' });
    expect(await storage.listKeys(recording.prefix)).toEqual([]);
  });

  it('shows progress in the row while ffmpeg runs, and removes its work folder afterwards', async () => {
    const recording = await stored(video);
    const folders: string[] = [];
    let seen = -1;
    const watched: ProcessMedia = async (options) => {
      folders.push(options.workDir, options.inputPath);
      options.onProgress?.(50);
      // 50 % of ffmpeg's part is 47 % overall: the last few percent are the uploads.
      seen = await waitFor(async () => ((await recordingRow(database.knex, recording.id)).progress === 47 ? 47 : null));
      return processMedia(options);
    };
    await run(recording.id, { processMedia: watched });
    expect(seen).toBe(47);
    expect(await recordingRow(database.knex, recording.id)).toMatchObject({ state: 'ready', progress: 100 });
    for (const folder of folders) await expect(access(folder)).rejects.toMatchObject({ code: 'ENOENT' });
  });
});
