// Test helpers (imported by *.test.ts only): recording rows written directly, objects put into the S3 fake.
import { randomUUID } from 'node:crypto';
import type { Knex } from 'knex';
import type { FailureCode, RecordingState } from '@core/contracts';
import { recordingKeys, recordingPrefix } from '@core/recordings';
import type { ObjectStorage } from '../../storage/object-storage';
import type { ThumbnailGrid } from './thumbnails-vtt';

export interface RecordingOptions {
  id?: string;
  schoolId: string;
  ownerId: string | null;
  title?: string;
  originalFileName?: string;
  state?: RecordingState;
  progress?: number;
  failureCode?: FailureCode;
  failureMessage?: string;
  declaredSize?: number;
  storedSize?: number | null;
  durationSeconds?: number | null;
  width?: number;
  height?: number;
  createdAt?: Date;
  renditionKey?: string | null;
  posterKey?: string | null;
  thumbnails?: ThumbnailGrid | null;
}

/** A recording row as the upload and the worker would leave it; keys follow `recordingKeys`. */
export async function insertRecording(db: Knex, options: RecordingOptions) {
  const id = options.id ?? randomUUID();
  const prefix = recordingPrefix(options.schoolId, id);
  const state = options.state ?? 'ready';
  const ready = state === 'ready';
  const keys = {
    original: recordingKeys.original(prefix),
    rendition: recordingKeys.rendition(prefix),
    poster: recordingKeys.poster(prefix),
    sheet: (index: number) => recordingKeys.thumbnailSheet(prefix, index),
  };
  await db('recordings').insert({
    id,
    school_id: options.schoolId,
    owner_id: options.ownerId,
    title: options.title ?? `Recording ${id.slice(0, 8)}`,
    original_file_name: options.originalFileName ?? 'clip.mp4',
    state,
    progress: options.progress ?? (ready ? 100 : 0),
    failure_code: options.failureCode ?? (state === 'failed' ? 'processing_error' : null),
    failure_message: options.failureMessage ?? (state === 'failed' ? 'Processing stopped unexpectedly.' : null),
    declared_size: options.declaredSize ?? 1000,
    stored_size: options.storedSize === undefined ? (state === 'uploading' ? null : (options.declaredSize ?? 1000)) : options.storedSize,
    content_type: 'video/mp4',
    original_key: keys.original,
    rendition_key: options.renditionKey === undefined ? (ready ? keys.rendition : null) : options.renditionKey,
    poster_key: options.posterKey === undefined ? (ready ? keys.poster : null) : options.posterKey,
    duration_seconds: options.durationSeconds === undefined ? (ready ? 12 : null) : options.durationSeconds,
    width: options.width ?? (ready ? 1280 : null),
    height: options.height ?? (ready ? 720 : null),
    thumbnails: options.thumbnails ? JSON.stringify(options.thumbnails) : null,
    created_at: options.createdAt ?? new Date(),
    updated_at: options.createdAt ?? new Date(),
  });
  return { id, prefix, keys };
}

/** Distinct, position-dependent bytes, so a range read can be checked byte for byte. */
export function patternBytes(length: number, seed = 7): Buffer {
  const bytes = Buffer.alloc(length);
  for (let i = 0; i < length; i++) bytes[i] = (i * 31 + seed) % 251;
  return bytes;
}

/**
 * A ready recording with its objects stored: original, rendition, poster and thumbnail sheets of a
 * 2x2 grid of 160x90 tiles every 4 s (`tiles` per sheet; the default [3] covers the 12 s default).
 */
export async function insertReadyRecording(db: Knex, storage: ObjectStorage, options: RecordingOptions & { tiles?: number[] }) {
  const id = randomUUID();
  const prefix = recordingPrefix(options.schoolId, id);
  const thumbnails: ThumbnailGrid = {
    intervalSeconds: 4,
    columns: 2,
    rows: 2,
    tileWidth: 160,
    tileHeight: 90,
    sheets: (options.tiles ?? [3]).map((tiles, index) => ({ key: recordingKeys.thumbnailSheet(prefix, index), tiles })),
  };
  const created = await insertRecording(db, { thumbnails, ...options, id, state: 'ready' });
  await storage.put(created.keys.original, patternBytes(3000, 1), 'video/quicktime');
  await storage.put(created.keys.rendition, patternBytes(64 * 1024, 2), 'video/mp4');
  await storage.put(created.keys.poster, patternBytes(500, 3), 'image/jpeg');
  for (const [index, sheet] of thumbnails.sheets.entries()) await storage.put(sheet.key, patternBytes(800, 10 + index), 'image/jpeg');
  return { ...created, thumbnails };
}

/** The `uploads` row of an upload still open behind an `uploading` recording. */
export async function insertOpenUpload(
  db: Knex,
  recording: { id: string; keys: { original: string } },
  owner: { id: string; schoolId: string },
  s3UploadId = 'no-multipart-in-storage',
): Promise<string> {
  const [row] = await db('uploads')
    .insert({
      school_id: owner.schoolId,
      owner_id: owner.id,
      recording_id: recording.id,
      object_key: recording.keys.original,
      s3_upload_id: s3UploadId,
      file_name: 'clip.mp4',
      declared_type: 'video/mp4',
      declared_size: 1000,
      part_size: 8 * 1024 * 1024,
      part_count: 1,
      file_last_modified: 0,
      first_part_sha256: '0'.repeat(64),
    })
    .returning('id');
  return (row as { id: string }).id;
}
