import type { Knex } from 'knex';
import type { RecordingDetailDto, RecordingDto, RecordingListQuery } from '@core/contracts';
import { recordingPrefix } from '@core/recordings';
import type { Actor } from '../../auth/actor';
import type { JobQueue } from '../../jobs/job-queue';
import type { ObjectStorage } from '../../storage/object-storage';
import { ConflictError, NotFoundError } from '../../errors';
import * as repo from './recordings.repository';
import * as read from './recordings.read-model';
import { listCaptions } from './captions.repository';
import { loadEditable, loadViewable } from './recording-access';
import { canViewRecording } from './recordings.policy';
import { presentCaption, presentRecording } from './recordings.presenter';
import { isRetryable, notRetryableReason, RETRYABLE_FAILURES } from './retry-rule';
import { parseThumbnailGrid } from './thumbnails-vtt';
import { createMediaUrls, type MediaUrls } from './media-urls';
import { createRecordingMediaService } from './recording-media.service';
import { createCaptionsService } from './captions.service';

/** How many lessons a refusal names before it says "and N more". */
const NAMED_USES = 3;

/** Why a recording cannot be deleted, naming the lessons built on it and what to do instead. */
export function inUseSentence(uses: read.LessonUse[]): string {
  // A published version keeps its recording for good (its students' answers refer to the video).
  const keeps = 'a lesson that was ever published keeps its recording: archive it to hide it instead.';
  const quoted = uses.slice(0, NAMED_USES).map((use) => `“${use.title}”`);
  if (uses.length === 1) return `The lesson ${quoted[0]} uses this recording, so it cannot be deleted. Delete that lesson first; ${keeps}`;
  const rest = uses.length - quoted.length;
  const names = rest > 0 ? `${quoted.join(', ')} and ${rest} more` : `${quoted.slice(0, -1).join(', ')} and ${quoted.at(-1)}`;
  return `${uses.length} lessons use this recording (${names}), so it cannot be deleted. Delete those lessons first; ${keeps}`;
}

interface Deps {
  db: Knex;
  storage: ObjectStorage;
  jobs: JobQueue;
  urls: MediaUrls;
}

/** The library: list, detail, rename, delete and retry of a school's recordings. */
export function createRecordingsService({ db, storage, jobs, urls }: Deps) {
  async function present(actor: Actor, row: read.RecordingView, usedBy?: read.LessonUse[]): Promise<RecordingDto> {
    const uses = usedBy ?? (await read.listLessonUses(db, row.schoolId, [row.id])).get(row.id) ?? [];
    return presentRecording(row, actor, await urls.poster(row.posterKey), uses);
  }

  async function reload(actor: Actor, recordingId: string): Promise<RecordingDto> {
    return present(actor, await loadViewable(db, actor, recordingId));
  }

  /** Every object key the row names that is not under the prefix (none when written as planned). */
  function keysOutsidePrefix(row: read.RecordingView, prefix: string): string[] {
    const sheets = parseThumbnailGrid(row.thumbnails)?.sheets.map((sheet) => sheet.key) ?? [];
    return [row.originalKey, row.renditionKey, row.posterKey, ...sheets].filter(
      (key): key is string => key !== null && !key.startsWith(prefix),
    );
  }

  return {
    async list(actor: Actor, query: RecordingListQuery): Promise<RecordingDto[]> {
      const rows = (await read.listRecordingViews(db, actor.active.schoolId, actor.userId, query)).filter((row) =>
        canViewRecording(actor, row),
      );
      // One query for the whole page's lessons, not one per recording.
      const uses = await read.listLessonUses(
        db,
        actor.active.schoolId,
        rows.map((row) => row.id),
      );
      return Promise.all(rows.map((row) => present(actor, row, uses.get(row.id) ?? [])));
    },

    async detail(actor: Actor, recordingId: string): Promise<RecordingDetailDto> {
      const row = await loadViewable(db, actor, recordingId);
      const captions = await listCaptions(db, row.id);
      return { ...(await present(actor, row)), captions: captions.map(presentCaption) };
    },

    async rename(actor: Actor, recordingId: string, title: string): Promise<RecordingDto> {
      const row = await loadEditable(db, actor, recordingId);
      await repo.updateTitle(db, row.schoolId, row.id, title);
      return reload(actor, row.id);
    },

    /**
     * Deletes a recording with every object under its prefix; an upload still open is aborted in
     * storage first. Storage goes before the row, inside the row's lock: if storage is down the
     * answer is 503 and the recording stays listed, so it can be deleted again later.
     */
    async remove(actor: Actor, recordingId: string): Promise<void> {
      const row = await loadEditable(db, actor, recordingId);
      const prefix = recordingPrefix(row.schoolId, row.id);
      await db.transaction(async (trx) => {
        const locked = await repo.lockRecording(trx, row.schoolId, row.id);
        if (!locked) throw new NotFoundError('That recording');
        // Checked under the lock, before storage is touched (the foreign key would refuse too, but too late).
        const uses = (await read.listLessonUses(trx, row.schoolId, [row.id])).get(row.id) ?? [];
        if (uses.length > 0) throw new ConflictError('recording_in_use', inUseSentence(uses));
        if (locked.state === 'uploading') {
          const upload = await repo.findOpenUpload(trx, row.schoolId, row.id);
          if (upload) {
            await storage.abortMultipart(upload.objectKey, upload.s3UploadId);
            await repo.markUploadAborted(trx, upload.id);
          }
        }
        await storage.deletePrefix(prefix);
        const outside = keysOutsidePrefix(row, prefix);
        if (outside.length > 0) await storage.deleteKeys(outside);
        await repo.deleteRecording(trx, row.schoolId, row.id);
      });
    },

    /** Processing again after a failure that may pass next time (see retry-rule.ts); queued in the same transaction. */
    async retry(actor: Actor, recordingId: string): Promise<RecordingDto> {
      const row = await loadEditable(db, actor, recordingId);
      await db.transaction(async (trx) => {
        const locked = await repo.lockRecording(trx, row.schoolId, row.id);
        if (!locked) throw new NotFoundError('That recording');
        const retried =
          isRetryable(locked.state, locked.failureCode) && (await repo.markForRetry(trx, row.schoolId, row.id, [...RETRYABLE_FAILURES]));
        if (!retried) throw new ConflictError('not_retryable', notRetryableReason(locked.state, locked.failureCode));
        await jobs.enqueueProcessing(row.id, { trx });
      });
      return reload(actor, row.id);
    },
  };
}

export type RecordingsService = ReturnType<typeof createRecordingsService>;

/** Everything the recordings routes need, built from the app's dependencies (one line in app.ts). */
export function createRecordingsServices(deps: { db: Knex; storage: ObjectStorage; jobs: JobQueue; playbackMinutes: number }) {
  const urls = createMediaUrls(deps.storage, deps.playbackMinutes);
  return {
    recordings: createRecordingsService({ ...deps, urls }),
    media: createRecordingMediaService({ ...deps, urls }),
    captions: createCaptionsService(deps.db),
  };
}
