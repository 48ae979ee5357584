import type { CaptionDto, FailureCode, RecordingDto } from '@core/contracts';
import type { Actor } from '../../auth/actor';
import type { LessonUse, RecordingView } from './recordings.read-model';
import type { CaptionRow } from './captions.repository';
import { canEditRecording } from './recordings.policy';
import { isRetryable } from './retry-rule';

/** Shown when a failure was stored without its sentence (it should not happen, but the teacher still gets words). */
const FALLBACK_FAILURE_MESSAGE = 'Processing failed for a reason that was not recorded.';

export const captionFilePath = (recordingId: string, captionId: string) => `/api/recordings/${recordingId}/captions/${captionId}.vtt`;
export const thumbnailsPath = (recordingId: string) => `/api/recordings/${recordingId}/thumbnails.vtt`;

/**
 * A recording as the library shows it, with what the caller may do to it and the lessons built on
 * it (none for an upload that just finished: no lesson can use a recording before it is ready).
 */
export function presentRecording(row: RecordingView, actor: Actor, posterUrl: string | null, usedBy: LessonUse[] = []): RecordingDto {
  const failed = row.state === 'failed' && row.failureCode !== null;
  return {
    id: row.id,
    title: row.title,
    originalFileName: row.originalFileName,
    state: row.state,
    progress: row.progress,
    failure: failed
      ? {
          code: row.failureCode as FailureCode,
          message: row.failureMessage ?? FALLBACK_FAILURE_MESSAGE,
          retryable: isRetryable(row.state, row.failureCode),
        }
      : null,
    sizeBytes: row.storedSize ?? row.declaredSize,
    durationSeconds: row.durationSeconds,
    width: row.width,
    height: row.height,
    frameRate: row.frameRate,
    videoCodec: row.videoCodec,
    audioCodec: row.audioCodec,
    rotation: row.rotation,
    renditionMode: row.renditionMode,
    posterUrl,
    owner: row.ownerId && row.ownerName !== null ? { id: row.ownerId, name: row.ownerName } : null,
    canEdit: canEditRecording(actor, row),
    // Only the owner can continue an upload, so only they are told its id.
    uploadId: row.state === 'uploading' && row.ownerId === actor.userId ? row.openUploadId : null,
    usedBy: usedBy.map((use) => ({ id: use.id, title: use.title, state: use.state })),
    createdAt: new Date(row.createdAt).toISOString(),
    updatedAt: new Date(row.updatedAt).toISOString(),
  };
}

export function presentCaption(row: CaptionRow): CaptionDto {
  return {
    id: row.id,
    language: row.language,
    label: row.label,
    isDefault: row.isDefault,
    cueCount: row.cueCount,
    url: captionFilePath(row.recordingId, row.id),
    updatedAt: new Date(row.updatedAt).toISOString(),
  };
}
