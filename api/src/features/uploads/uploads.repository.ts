import type { Knex } from 'knex';
import { FAILURE_CODES, type FailureCode, type RecordingState } from '@core/contracts';
import type { Db } from '../../db/knex';
import { RETRYABLE_FAILURES } from '../recordings/retry-rule';

export type UploadStatus = 'uploading' | 'completed' | 'aborted';

export interface UploadRow {
  id: string;
  schoolId: string;
  ownerId: string;
  recordingId: string | null;
  objectKey: string;
  s3UploadId: string;
  fileName: string;
  declaredType: string;
  declaredSize: number;
  partSize: number;
  partCount: number;
  fileLastModified: number;
  firstPartSha256: string;
  status: UploadStatus;
  createdAt: Date;
  lastActivityAt: Date;
}

const UPLOAD_COLUMNS = [
  'id',
  'school_id as schoolId',
  'owner_id as ownerId',
  'recording_id as recordingId',
  'object_key as objectKey',
  's3_upload_id as s3UploadId',
  'file_name as fileName',
  'declared_type as declaredType',
  'declared_size as declaredSize',
  'part_size as partSize',
  'part_count as partCount',
  'file_last_modified as fileLastModified',
  'first_part_sha256 as firstPartSha256',
  'status',
  'created_at as createdAt',
  'last_activity_at as lastActivityAt',
];

/**
 * Failures after which the original object is gone: completion deletes refused uploads and the
 * worker deletes files that can never play. Only retryable failures keep it, so only they count.
 */
export const OBJECT_DELETED_FAILURES: FailureCode[] = FAILURE_CODES.filter((code) => !RETRYABLE_FAILURES.has(code));

/** One upload of one school by id: never by id alone. */
export async function findUpload(db: Db, schoolId: string, uploadId: string, forUpdate = false): Promise<UploadRow | undefined> {
  const query = db('uploads').select(UPLOAD_COLUMNS).where({ id: uploadId, school_id: schoolId }).first();
  return forUpdate ? query.forUpdate() : query;
}

/** The owner's unfinished uploads in one school, newest first. */
export async function listOpenUploads(db: Db, schoolId: string, ownerId: string): Promise<UploadRow[]> {
  return (
    db('uploads')
      .select(UPLOAD_COLUMNS)
      .where({ school_id: schoolId, owner_id: ownerId, status: 'uploading' })
      // An upload whose recording was deleted has nothing left to continue.
      .whereNotNull('recording_id')
      .orderBy('created_at', 'desc')
  );
}

/** Serialises quota decisions of one owner, so two uploads started at once cannot both squeeze in. */
export async function lockOwnerQuota(trx: Knex.Transaction, ownerId: string): Promise<void> {
  await trx.raw("SELECT pg_advisory_xact_lock(hashtextextended('recording-quota:' || ?, 0))", [ownerId]);
}

/** Bytes the owner's recordings take in one school: stored size once known, else the size promised. */
export async function usedBytes(db: Db, schoolId: string, ownerId: string, excludeRecordingId?: string): Promise<number> {
  const query = db('recordings')
    .where({ school_id: schoolId, owner_id: ownerId })
    .where((q) => q.whereNot('state', 'failed').orWhereNull('failure_code').orWhereNotIn('failure_code', OBJECT_DELETED_FAILURES))
    .first(db.raw('COALESCE(SUM(COALESCE(stored_size, declared_size)), 0)::bigint AS used'));
  if (excludeRecordingId) query.whereNot('id', excludeRecordingId);
  const row = (await query) as { used: number | string } | undefined;
  return Number(row?.used ?? 0);
}

export async function insertRecording(
  db: Db,
  row: {
    id: string;
    schoolId: string;
    ownerId: string;
    title: string;
    originalFileName: string;
    declaredSize: number;
    originalKey: string;
  },
): Promise<void> {
  await db('recordings').insert({
    id: row.id,
    school_id: row.schoolId,
    owner_id: row.ownerId,
    title: row.title,
    original_file_name: row.originalFileName,
    state: 'uploading',
    declared_size: row.declaredSize,
    original_key: row.originalKey,
  });
}

export async function insertUpload(
  db: Db,
  row: Omit<UploadRow, 'id' | 'status' | 'createdAt' | 'lastActivityAt' | 'recordingId'> & { recordingId: string },
): Promise<UploadRow> {
  const [created] = await db('uploads')
    .insert({
      school_id: row.schoolId,
      owner_id: row.ownerId,
      recording_id: row.recordingId,
      object_key: row.objectKey,
      s3_upload_id: row.s3UploadId,
      file_name: row.fileName,
      declared_type: row.declaredType,
      declared_size: row.declaredSize,
      part_size: row.partSize,
      part_count: row.partCount,
      file_last_modified: row.fileLastModified,
      first_part_sha256: row.firstPartSha256,
    })
    .returning(UPLOAD_COLUMNS);
  return created as UploadRow;
}

/** Marks the upload as still alive, so the abandoned-upload cleanup leaves it alone. */
export async function touchUpload(db: Db, uploadId: string): Promise<Date> {
  const [row] = await db('uploads')
    .where({ id: uploadId, status: 'uploading' })
    .update({ last_activity_at: db.fn.now() })
    .returning('last_activity_at as lastActivityAt');
  return (row as { lastActivityAt: Date } | undefined)?.lastActivityAt ?? new Date();
}

export async function finishUpload(db: Db, uploadId: string, status: Exclude<UploadStatus, 'uploading'>): Promise<number> {
  return db('uploads')
    .where({ id: uploadId, status: 'uploading' })
    .update({ status, finished_at: db.fn.now(), last_activity_at: db.fn.now() });
}

export async function setRecordingState(
  db: Db,
  recordingId: string,
  change: { state: RecordingState; storedSize: number; failure?: { code: FailureCode; message: string } },
): Promise<void> {
  await db('recordings')
    .where({ id: recordingId })
    .update({
      state: change.state,
      stored_size: change.storedSize,
      progress: 0,
      failure_code: change.failure?.code ?? null,
      failure_message: change.failure?.message ?? null,
      updated_at: db.fn.now(),
    });
}

/** Deletes a recording row only while it is still an unfinished upload. */
export async function deleteUploadingRecording(db: Db, recordingId: string): Promise<number> {
  return db('recordings').where({ id: recordingId, state: 'uploading' }).delete();
}

/** Unfinished uploads idle since before the cutoff (any school: the cleanup job runs for all). */
export async function listIdleUploadIds(db: Db, cutoff: Date): Promise<string[]> {
  const rows = await db('uploads')
    .where({ status: 'uploading' })
    .where('last_activity_at', '<', cutoff)
    .orderBy('last_activity_at')
    .select('id');
  return rows.map((row: { id: string }) => row.id);
}

/** Locks one idle upload for the cleanup, skipping it if a request holds it or it came back to life. */
export async function lockIdleUpload(trx: Knex.Transaction, uploadId: string, cutoff: Date): Promise<UploadRow | undefined> {
  return trx('uploads')
    .select(UPLOAD_COLUMNS)
    .where({ id: uploadId, status: 'uploading' })
    .where('last_activity_at', '<', cutoff)
    .forUpdate()
    .skipLocked()
    .first();
}
