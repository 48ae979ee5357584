import type { Knex } from 'knex';
import type { PlaybackDto } from '@core/contracts';
import type { Actor } from '../../auth/actor';
import { NotFoundError } from '../../errors';
import { findCaptionText } from '../recordings/captions.repository';
import type { RecordingMediaService } from '../recordings/recording-media.service';
import { loadViewableLesson } from './lesson-access';

export const lessonThumbnailsPath = (lessonId: string) => `/api/lessons/${lessonId}/thumbnails.vtt`;
export const lessonCaptionPath = (lessonId: string, captionId: string) => `/api/lessons/${lessonId}/captions/${captionId}.vtt`;

/**
 * A lesson's recording for everyone who may view the lesson. Substitutes and coordinators cannot
 * open the recordings library, so the track URLs in the answer point at the lesson's own routes.
 */
export function createLessonMediaService({ db, media }: { db: Knex; media: RecordingMediaService }) {
  return {
    async playback(actor: Actor, lessonId: string): Promise<PlaybackDto> {
      const lesson = await loadViewableLesson(db, actor, lessonId);
      const playback = await media.playbackAuthorised(lesson.schoolId, lesson.recordingId);
      return {
        ...playback,
        thumbnailsUrl: playback.thumbnailsUrl === null ? null : lessonThumbnailsPath(lesson.id),
        captions: playback.captions.map((caption) => ({ ...caption, url: lessonCaptionPath(lesson.id, caption.id) })),
      };
    },

    async thumbnailsVtt(actor: Actor, lessonId: string): Promise<string> {
      const lesson = await loadViewableLesson(db, actor, lessonId);
      return media.thumbnailsVttAuthorised(lesson.schoolId, lesson.recordingId);
    },

    /** A caption track of the lesson's recording (found only through the lesson's own recording). */
    async captionFile(actor: Actor, lessonId: string, captionId: string): Promise<string> {
      const lesson = await loadViewableLesson(db, actor, lessonId);
      const text = await findCaptionText(db, lesson.recordingId, captionId);
      if (text === undefined) throw new NotFoundError('That caption track');
      return text;
    },
  };
}

export type LessonMediaService = ReturnType<typeof createLessonMediaService>;
