import { randomUUID } from 'node:crypto';
import type { Knex } from 'knex';
import type {
  OpenUploadListDto,
  RecordingDto,
  SignedPartDto,
  StoredPartListDto,
  UploadComplete,
  UploadCreate,
  UploadDto,
  UploadResume,
} from '@core/contracts';
import { partCountFor, partLength, partSizeFor, recordingKeys, recordingPrefix } from '@core/recordings';
import type { Actor } from '../../auth/actor';
import { AppError, ConflictError, NotFoundError, ValidationError } from '../../errors';
import type { JobQueue } from '../../jobs/job-queue';
import type { ObjectStorage, StoredPart } from '../../storage/object-storage';
import { discardUpload } from './abandoned-uploads';
import {
  ACCEPT,
  checkDeclaredFile,
  completionVerdict,
  fileDifferences,
  quotaMessage,
  storedContentType,
  titleFromFileName,
} from './file-checks';
import { partProblems, partsToJoin } from './part-checks';
import * as repo from './uploads.repository';
import { canUseUpload } from './uploads.policy';
import { presentOpenUpload, presentUpload } from './uploads.presenter';
// The answer to a completion is the recording exactly as the library presents it.
import { findRecordingView } from '../recordings/recordings.read-model';
import { presentRecording } from '../recordings/recordings.presenter';
import { createMediaUrls } from '../recordings/media-urls';

/** Part URLs last an hour: long enough for a large part on slow school Wi-Fi, short if one leaks. */
export const PART_URL_SECONDS = 3600;

export interface UploadsDeps {
  db: Knex;
  storage: ObjectStorage;
  jobs: JobQueue;
  env: { UPLOAD_MAX_BYTES: number; UPLOAD_QUOTA_BYTES: number; PLAYBACK_URL_MINUTES: number };
}

function isNoSuchUpload(error: unknown): boolean {
  const e = error as { name?: string; Code?: string; $metadata?: { httpStatusCode?: number } };
  return e?.name === 'NoSuchUpload' || e?.Code === 'NoSuchUpload' || e?.$metadata?.httpStatusCode === 404;
}

function finishedError(upload: repo.UploadRow): ConflictError {
  if (upload.status === 'aborted')
    return new ConflictError('upload_finished', 'This upload was cancelled: start it again to send the file.');
  if (!upload.recordingId) {
    return new ConflictError('upload_finished', 'The recording of this upload was deleted: start a new upload if you still need the file.');
  }
  return new ConflictError('upload_finished', 'This upload is already finished: the recording is in the library.');
}

/** Direct uploads to storage: the API checks and signs; the bytes go from the browser straight to S3. */
export function createUploadsService({ db, storage, jobs, env }: UploadsDeps) {
  const mediaUrls = createMediaUrls(storage, env.PLAYBACK_URL_MINUTES);

  async function loadOwn(actor: Actor, uploadId: string): Promise<repo.UploadRow> {
    const upload = await repo.findUpload(db, actor.active.schoolId, uploadId);
    if (!upload || !canUseUpload(actor, upload)) throw new NotFoundError('That upload');
    return upload;
  }

  async function loadOpen(actor: Actor, uploadId: string): Promise<repo.UploadRow> {
    const upload = await loadOwn(actor, uploadId);
    if (upload.status !== 'uploading' || !upload.recordingId) throw finishedError(upload);
    return upload;
  }

  /** The parts storage holds; an upload storage no longer knows is explained, not a 500. */
  async function storedParts(upload: repo.UploadRow): Promise<StoredPart[]> {
    try {
      return await storage.listParts(upload.objectKey, upload.s3UploadId);
    } catch (error) {
      if (!isNoSuchUpload(error)) throw error;
      throw new ConflictError(
        'upload_gone',
        'Storage no longer holds this unfinished upload (it was cleaned up): remove it and upload the file again.',
      );
    }
  }

  async function recordingAnswer(actor: Actor, recordingId: string): Promise<RecordingDto> {
    const row = await findRecordingView(db, actor.active.schoolId, recordingId);
    if (!row) throw new NotFoundError('That recording');
    return presentRecording(row, actor, await mediaUrls.poster(row.posterKey));
  }

  /** A completion already done answers as it did the first time, redoing nothing. */
  async function answerFinished(actor: Actor, upload: repo.UploadRow): Promise<RecordingDto> {
    if (upload.status === 'aborted' || !upload.recordingId) throw finishedError(upload);
    const recording = await recordingAnswer(actor, upload.recordingId);
    const failure = recording.failure;
    if (failure && repo.OBJECT_DELETED_FAILURES.includes(failure.code)) throw new ValidationError(failure.message, undefined, failure.code);
    return recording;
  }

  return {
    async listOpen(actor: Actor): Promise<OpenUploadListDto> {
      const { schoolId } = actor.active;
      const rows = await repo.listOpenUploads(db, schoolId, actor.userId);
      const uploads = await Promise.all(
        rows.map(async (row) => {
          // An upload storage has forgotten shows as nothing sent; continuing it explains why.
          const parts = await storage.listParts(row.objectKey, row.s3UploadId).catch((error: unknown) => {
            if (isNoSuchUpload(error)) return [];
            throw error;
          });
          return presentOpenUpload(row, parts);
        }),
      );
      return {
        uploads,
        limits: {
          maxBytes: env.UPLOAD_MAX_BYTES,
          quotaBytes: env.UPLOAD_QUOTA_BYTES,
          usedBytes: await repo.usedBytes(db, schoolId, actor.userId),
          accept: ACCEPT,
        },
      };
    },

    /** Checks the declared file, then creates the recording row, the S3 multipart upload and the upload row together. */
    async create(actor: Actor, input: UploadCreate): Promise<UploadDto> {
      const problem = checkDeclaredFile(input, env.UPLOAD_MAX_BYTES);
      if (problem) {
        const path = problem.code === 'not_video' ? 'type' : 'size';
        throw new ValidationError(problem.message, [{ path, message: problem.message }], problem.code);
      }
      const schoolId = actor.active.schoolId;
      const recordingId = randomUUID();
      const key = recordingKeys.original(recordingPrefix(schoolId, recordingId));
      const partSize = partSizeFor(input.size);
      let s3UploadId: string | undefined;
      try {
        const row = await db.transaction(async (trx) => {
          await repo.lockOwnerQuota(trx, actor.userId);
          const used = await repo.usedBytes(trx, schoolId, actor.userId);
          if (used + input.size > env.UPLOAD_QUOTA_BYTES) {
            const message = quotaMessage(used, input.size, env.UPLOAD_QUOTA_BYTES);
            throw new ValidationError(message, [{ path: 'size', message }], 'quota_exceeded');
          }
          await repo.insertRecording(trx, {
            id: recordingId,
            schoolId,
            ownerId: actor.userId,
            title: titleFromFileName(input.fileName),
            originalFileName: input.fileName,
            declaredSize: input.size,
            originalKey: key,
          });
          // Inside the transaction: if storage refuses, the recording row is rolled back with it.
          s3UploadId = await storage.createMultipart(key, storedContentType(input.type));
          return repo.insertUpload(trx, {
            schoolId,
            ownerId: actor.userId,
            recordingId,
            objectKey: key,
            s3UploadId,
            fileName: input.fileName,
            declaredType: input.type,
            declaredSize: input.size,
            partSize,
            partCount: partCountFor(input.size, partSize),
            fileLastModified: input.lastModified,
            firstPartSha256: input.firstPartSha256,
          });
        });
        return presentUpload(row);
      } catch (error) {
        // Storage has a multipart upload the database never recorded: abort it so nothing is orphaned.
        if (s3UploadId) await storage.abortMultipart(key, s3UploadId).catch(() => undefined);
        throw error;
      }
    },

    /** A re-chosen file continues an upload only if it is provably the same file. */
    async resume(actor: Actor, uploadId: string, facts: UploadResume): Promise<UploadDto> {
      const upload = await loadOpen(actor, uploadId);
      const differences = fileDifferences(facts, {
        fileName: upload.fileName,
        size: upload.declaredSize,
        lastModified: upload.fileLastModified,
        firstPartSha256: upload.firstPartSha256,
      });
      if (differences.length > 0) {
        throw new AppError(409, 'file_mismatch', `This is not the same file: ${differences[0]!.message}.`, differences);
      }
      return presentUpload({ ...upload, lastActivityAt: await repo.touchUpload(db, upload.id) });
    },

    async listParts(actor: Actor, uploadId: string): Promise<StoredPartListDto> {
      const upload = await loadOpen(actor, uploadId);
      const parts = await storedParts(upload);
      await repo.touchUpload(db, upload.id);
      return { parts };
    },

    /** A URL for one part, signed for exactly that part's length, so nothing beyond the declared size can be sent. */
    async signPart(actor: Actor, uploadId: string, partNumber: number): Promise<SignedPartDto> {
      const upload = await loadOpen(actor, uploadId);
      if (partNumber > upload.partCount) {
        const message = `This upload has ${upload.partCount} part${upload.partCount === 1 ? '' : 's'}: there is no part ${partNumber}.`;
        throw new ValidationError(message, [{ path: 'partNumber', message }]);
      }
      const contentLength = partLength(upload.declaredSize, upload.partSize, partNumber);
      const url = await storage.signPart(upload.objectKey, upload.s3UploadId, partNumber, contentLength, PART_URL_SECONDS);
      await repo.touchUpload(db, upload.id);
      return { url, contentLength, expiresAt: new Date(Date.now() + PART_URL_SECONDS * 1000).toISOString() };
    },

    /**
     * Joins the parts, then checks the stored object against what was promised and allowed. A
     * refused object is deleted and its recording kept as failed with the reason; an accepted one
     * goes to processing, queued in the same transaction. Completing twice redoes nothing.
     */
    async complete(actor: Actor, uploadId: string, input: UploadComplete): Promise<RecordingDto> {
      const upload = await loadOwn(actor, uploadId);
      if (upload.status !== 'uploading' || !upload.recordingId) return answerFinished(actor, upload);
      const recordingId = upload.recordingId;
      const { schoolId } = actor.active;

      // An object already there means an earlier completion assembled it and then stopped short.
      let head = await storage.head(upload.objectKey);
      if (!head) {
        const stored = await storedParts(upload);
        const problem = partProblems(upload.partCount, stored, input.parts);
        if (problem) throw problem;
        await storage.completeMultipart(upload.objectKey, upload.s3UploadId, partsToJoin(upload.partCount, stored));
        head = await storage.head(upload.objectKey);
        if (!head) throw new Error(`Storage completed ${upload.objectKey} but does not show the object.`);
      }
      const storedSize = head.size;

      const verdict = await db.transaction(async (trx) => {
        await repo.lockOwnerQuota(trx, upload.ownerId);
        const current = await repo.findUpload(trx, schoolId, upload.id, true);
        if (!current || current.status !== 'uploading') return null;
        const verdict = completionVerdict({
          storedSize,
          declaredSize: upload.declaredSize,
          maxBytes: env.UPLOAD_MAX_BYTES,
          usedBytes: await repo.usedBytes(trx, schoolId, upload.ownerId, recordingId),
          quotaBytes: env.UPLOAD_QUOTA_BYTES,
        });
        if (verdict.ok) {
          await repo.setRecordingState(trx, recordingId, { state: 'processing', storedSize });
          await jobs.enqueueProcessing(recordingId, { trx });
        } else {
          // Deleted before the row says so: if storage fails here, nothing is recorded and completing again retries.
          await storage.deleteKeys([upload.objectKey]);
          await repo.setRecordingState(trx, recordingId, { state: 'failed', storedSize, failure: verdict });
        }
        await repo.finishUpload(trx, upload.id, 'completed');
        return verdict;
      });
      if (verdict && !verdict.ok) throw new ValidationError(verdict.message, undefined, verdict.code);
      if (!verdict) return answerFinished(actor, (await repo.findUpload(db, schoolId, upload.id))!);
      return recordingAnswer(actor, recordingId);
    },

    /** Cancels an unfinished upload: its parts, its object if assembled, and its `uploading` recording row go. */
    async abort(actor: Actor, uploadId: string): Promise<void> {
      const upload = await loadOwn(actor, uploadId);
      if (upload.status === 'aborted') return;
      if (upload.status === 'completed') {
        throw new ConflictError('upload_finished', 'This upload is finished: delete the recording from the library instead.');
      }
      await discardUpload(db, storage, upload);
    },
  };
}

export type UploadsService = ReturnType<typeof createUploadsService>;
