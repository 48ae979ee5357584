import type { Db } from '../../db/knex';
import type { RecordingState } from '@core/contracts';

/**
 * Locks one recording of one school for the rest of the transaction (renames, deletes, retries and
 * caption changes of the same recording then run one after another); returns its state or undefined.
 */
export async function lockRecording(
  db: Db,
  schoolId: string,
  recordingId: string,
): Promise<{ id: string; state: RecordingState; failureCode: string | null } | undefined> {
  return db('recordings').where({ id: recordingId, school_id: schoolId }).forUpdate().first('id', 'state', 'failure_code as failureCode');
}

export async function updateTitle(db: Db, schoolId: string, recordingId: string, title: string): Promise<number> {
  return db('recordings').where({ id: recordingId, school_id: schoolId }).update({ title, updated_at: db.fn.now() });
}

/**
 * Puts a failed recording back in the queue's hands; the WHERE repeats the retry rule's codes so
 * two retries at once cannot both pass. Returns whether it changed.
 */
export async function markForRetry(db: Db, schoolId: string, recordingId: string, retryableCodes: readonly string[]): Promise<boolean> {
  const changed = await db('recordings')
    .where({ id: recordingId, school_id: schoolId, state: 'failed' })
    .whereIn('failure_code', [...retryableCodes])
    .update({ state: 'processing', progress: 0, failure_code: null, failure_message: null, updated_at: db.fn.now() });
  return changed === 1;
}

/** The multipart upload still open behind an `uploading` recording, if any. */
export async function findOpenUpload(
  db: Db,
  schoolId: string,
  recordingId: string,
): Promise<{ id: string; objectKey: string; s3UploadId: string } | undefined> {
  return db('uploads')
    .where({ recording_id: recordingId, school_id: schoolId, status: 'uploading' })
    .first('id', 'object_key as objectKey', 's3_upload_id as s3UploadId');
}

export async function markUploadAborted(db: Db, uploadId: string): Promise<void> {
  await db('uploads').where({ id: uploadId }).update({ status: 'aborted', finished_at: db.fn.now(), last_activity_at: db.fn.now() });
}

/** Deletes the row; its captions go with it (ON DELETE CASCADE), its upload row keeps a NULL link. */
export async function deleteRecording(db: Db, schoolId: string, recordingId: string): Promise<number> {
  return db('recordings').where({ id: recordingId, school_id: schoolId }).delete();
}
