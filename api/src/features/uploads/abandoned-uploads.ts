import type { Knex } from 'knex';
import type { ObjectStorage } from '../../storage/object-storage';
import * as repo from './uploads.repository';

/**
 * Gives up an unfinished upload: aborts it in storage (dropping its parts), deletes the object in
 * case a completion got as far as assembling it, marks the upload aborted and deletes its
 * recording row while that is still `uploading`. Storage goes first: if it is down, nothing in
 * the database changes and the upload can be given up again later.
 */
export async function discardUpload(db: Knex | Knex.Transaction, storage: ObjectStorage, upload: repo.UploadRow): Promise<void> {
  await storage.abortMultipart(upload.objectKey, upload.s3UploadId);
  await storage.deleteKeys([upload.objectKey]);
  const finish = async (trx: Knex.Transaction) => {
    const changed = await repo.finishUpload(trx, upload.id, 'aborted');
    if (changed > 0 && upload.recordingId) await repo.deleteUploadingRecording(trx, upload.recordingId);
  };
  await (db.isTransaction ? finish(db as Knex.Transaction) : (db as Knex).transaction(finish));
}

/**
 * The scheduled cleanup: every upload still `uploading` with no activity for `olderThanHours` is
 * discarded. Returns how many were. Each upload is handled on its own, locked, and re-checked, so
 * one that a teacher resumed a moment ago is left alone; if some fail (storage down), the rest are
 * still cleaned and the failures are thrown together at the end for the job to retry.
 */
export async function abortAbandonedUploads({
  db,
  storage,
  olderThanHours,
}: {
  db: Knex;
  storage: ObjectStorage;
  olderThanHours: number;
}): Promise<number> {
  const cutoff = new Date(Date.now() - olderThanHours * 3600_000);
  const failures: unknown[] = [];
  let discarded = 0;
  for (const uploadId of await repo.listIdleUploadIds(db, cutoff)) {
    try {
      const done = await db.transaction(async (trx) => {
        const upload = await repo.lockIdleUpload(trx, uploadId, cutoff);
        if (!upload) return false;
        await discardUpload(trx, storage, upload);
        return true;
      });
      if (done) discarded++;
    } catch (error) {
      failures.push(error);
    }
  }
  if (failures.length > 0) {
    throw new AggregateError(failures, `${failures.length} abandoned upload(s) could not be aborted (${discarded} were).`);
  }
  return discarded;
}
