import type { Db } from '../db/knex';
import type { FailureCode } from '@core/contracts';

/** What the worker needs of a recording row. */
export interface ProcessingRecording {
  id: string;
  schoolId: string;
  state: string;
  originalKey: string;
  processingAttempts: number;
}

/** The thumbnails jsonb: the sprite grid and where each sheet is stored. */
export interface ThumbnailsFacts {
  intervalSeconds: number;
  columns: number;
  rows: number;
  tileWidth: number;
  tileHeight: number;
  sheets: { key: string; tiles: number }[];
}

export interface ReadyFacts {
  contentType: string;
  renditionKey: string;
  posterKey: string;
  renditionMode: 'transcode' | 'remux';
  durationSeconds: number;
  width: number;
  height: number;
  frameRate: number | null;
  videoCodec: string | null;
  audioCodec: string | null;
  bitrate: number | null;
  rotation: number;
  thumbnails: ThumbnailsFacts;
}

interface Row {
  id: string;
  school_id: string;
  state: string;
  original_key: string;
  processing_attempts: number;
}

/** The recording a job is about, looked up by id (a job carries nothing else), or null if deleted. */
export async function findRecordingForProcessing(db: Db, id: string): Promise<ProcessingRecording | null> {
  const row = await db('recordings')
    .where({ id })
    .first<Row | undefined>('id', 'school_id', 'state', 'original_key', 'processing_attempts');
  if (!row) return null;
  return {
    id: row.id,
    schoolId: row.school_id,
    state: row.state,
    originalKey: row.original_key,
    processingAttempts: row.processing_attempts,
  };
}

/** Counts an attempt and resets progress; false when the recording is no longer waiting for processing. */
export async function startAttempt(db: Db, id: string): Promise<boolean> {
  const updated = await db('recordings')
    .where({ id, state: 'processing' })
    .update({
      processing_attempts: db.raw('processing_attempts + 1'),
      progress: 0,
      failure_code: null,
      failure_message: null,
      updated_at: db.fn.now(),
    });
  return updated === 1;
}

/** Raises progress (never lowers it, so a late write cannot move the bar back). */
export async function raiseProgress(db: Db, id: string, percent: number): Promise<void> {
  await db('recordings')
    .where({ id, state: 'processing' })
    .andWhere('progress', '<', percent)
    .update({ progress: percent, updated_at: db.fn.now() });
}

/** The one UPDATE that makes a recording playable; false when it was deleted or changed meanwhile. */
export async function markReady(db: Db, id: string, facts: ReadyFacts): Promise<boolean> {
  const updated = await db('recordings')
    .where({ id, state: 'processing' })
    .update({
      state: 'ready',
      progress: 100,
      failure_code: null,
      failure_message: null,
      content_type: facts.contentType,
      rendition_key: facts.renditionKey,
      poster_key: facts.posterKey,
      rendition_mode: facts.renditionMode,
      duration_seconds: facts.durationSeconds,
      width: facts.width,
      height: facts.height,
      frame_rate: facts.frameRate,
      video_codec: facts.videoCodec,
      audio_codec: facts.audioCodec,
      bitrate: facts.bitrate === null ? null : Math.round(facts.bitrate),
      rotation: facts.rotation,
      thumbnails: JSON.stringify(facts.thumbnails),
      processed_at: db.fn.now(),
      updated_at: db.fn.now(),
    });
  return updated === 1;
}

/** Ends processing in `failed` with a reason for the teacher; derived objects are gone or about to be, so their keys are cleared. */
export async function markFailed(db: Db, id: string, failure: { code: FailureCode; message: string }): Promise<boolean> {
  const updated = await db('recordings').where({ id, state: 'processing' }).update({
    state: 'failed',
    progress: 0,
    failure_code: failure.code,
    failure_message: failure.message,
    rendition_key: null,
    poster_key: null,
    thumbnails: null,
    updated_at: db.fn.now(),
  });
  return updated === 1;
}
