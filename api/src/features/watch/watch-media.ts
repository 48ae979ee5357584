import type { PlaybackDto } from '@core/contracts';
import type { Db } from '../../db/knex';
import { NotFoundError } from '../../errors';
import { findCaptionText } from '../recordings/captions.repository';
import type { RecordingMediaService } from '../recordings/recording-media.service';
import type { AssignmentContext } from '../responses/assignment-context';

export const studentThumbnailsPath = (assignmentId: string) => `/api/student/assignments/${assignmentId}/thumbnails.vtt`;
export const studentCaptionPath = (assignmentId: string, captionId: string) =>
  `/api/student/assignments/${assignmentId}/captions/${captionId}.vtt`;

/**
 * The assignment's recording for one of its students. Students cannot open the lesson or the
 * recordings library, so the track URLs point at the assignment's own routes; the caller has
 * already checked the student is assigned and the assignment takes answers.
 */
export function createWatchMedia({ db, media }: { db: Db; media: RecordingMediaService }) {
  return {
    async playback(ctx: AssignmentContext): Promise<PlaybackDto> {
      const playback = await media.playbackAuthorised(ctx.schoolId, ctx.recordingId);
      return {
        ...playback,
        thumbnailsUrl: playback.thumbnailsUrl === null ? null : studentThumbnailsPath(ctx.id),
        captions: playback.captions.map((caption) => ({ ...caption, url: studentCaptionPath(ctx.id, caption.id) })),
      };
    },

    thumbnailsVtt(ctx: AssignmentContext): Promise<string> {
      return media.thumbnailsVttAuthorised(ctx.schoolId, ctx.recordingId);
    },

    /** A caption track, found only through the assignment's own recording. */
    async captionFile(ctx: AssignmentContext, captionId: string): Promise<string> {
      const text = await findCaptionText(db, ctx.recordingId, captionId);
      if (text === undefined) throw new NotFoundError('That caption track');
      return text;
    },
  };
}

export type WatchMedia = ReturnType<typeof createWatchMedia>;
