import type { Knex } from 'knex';
import type { LessonCreate, LessonDto, LessonListDto, LessonListQuery, LessonUpdate } from '@core/contracts';
import type { Actor } from '../../auth/actor';
import { ConflictError, ForbiddenError, NotFoundError, ValidationError } from '../../errors';
import type { ObjectStorage } from '../../storage/object-storage';
import { createMediaUrls, type MediaUrls } from '../recordings/media-urls';
import { createRecordingMediaService } from '../recordings/recording-media.service';
import { loadViewable as loadViewableRecording } from '../recordings/recording-access';
import { loadEditableLesson, loadViewableLesson } from './lesson-access';
import { canDuplicateLesson } from './lessons.policy';
import * as repo from './lessons.repository';
import * as read from './lessons.read-model';
import { copyTitle, duplicateContent, initialContent, problemsOf } from './lesson-content';
import { presentLesson, presentLessonSummary, recordingFactsOf } from './lessons.presenter';
import { recordLessonAudit } from './lesson-audit.repository';
import { createLessonDraftsService } from './lesson-drafts.service';
import { createLessonMediaService } from './lesson-media.service';

interface Deps {
  db: Knex;
  urls: MediaUrls;
}

/** The lessons library: list, create, open, share or archive, delete and duplicate. */
export function createLessonsService({ db, urls }: Deps) {
  /** The lesson as its caller sees it; access was decided by whoever loaded it. */
  async function present(actor: Actor, lessonId: string): Promise<LessonDto> {
    const row = await read.findLessonDetail(db, actor.active.schoolId, lessonId);
    if (!row) throw new NotFoundError('That lesson');
    return presentLesson(row, actor, await urls.poster(row.recordingPosterKey), problemsOf(row.draft, recordingFactsOf(row)));
  }

  return {
    /** The lessons the caller may see (canViewLesson, as SQL), with the filters' choices. */
    async list(actor: Actor, query: LessonListQuery): Promise<LessonListDto> {
      const rows = await read.listLessonViews(db, actor, query);
      const lessons = await Promise.all(rows.map(async (row) => presentLessonSummary(row, await urls.poster(row.recordingPosterKey))));
      return { lessons, ...(await read.listFilterChoices(db, actor)) };
    },

    /** A new draft on a ready recording the caller may see, in the caller's department. */
    async create(actor: Actor, input: LessonCreate): Promise<LessonDto> {
      const recording = await loadViewableRecording(db, actor, input.recordingId);
      if (recording.state !== 'ready' || recording.renditionKey === null) {
        const message = `“${recording.title}” is not ready to play yet (${recording.state}), so a lesson cannot be built on it. Choose a ready recording.`;
        throw new ValidationError(message, [{ path: 'recordingId', message }], 'recording_not_ready');
      }
      const id = await repo.insertLesson(db, {
        schoolId: actor.active.schoolId,
        ownerId: actor.userId,
        departmentId: actor.active.departmentId,
        recordingId: recording.id,
        content: initialContent(input),
        copiedFromId: null,
      });
      return present(actor, id);
    },

    async detail(actor: Actor, lessonId: string): Promise<LessonDto> {
      const lesson = await loadViewableLesson(db, actor, lessonId);
      return present(actor, lesson.id);
    },

    /** Shares with the department (read-only) or stops sharing; archives or restores. Owner or admin. */
    async update(actor: Actor, lessonId: string, input: LessonUpdate): Promise<LessonDto> {
      const lesson = await loadEditableLesson(db, actor, lessonId);
      await db.transaction(async (trx) => {
        const locked = await repo.lockLesson(trx, lesson.schoolId, lesson.id);
        if (!locked) throw new NotFoundError('That lesson');
        await repo.updateFlags(trx, lesson.schoolId, lesson.id, input);
        if (input.shared !== undefined && input.shared !== lesson.shared) {
          await recordLessonAudit(trx, {
            schoolId: lesson.schoolId,
            actorId: actor.userId,
            action: input.shared ? 'lesson_shared' : 'lesson_unshared',
            lessonId: lesson.id,
            title: locked.title,
          });
        }
      });
      return present(actor, lesson.id);
    },

    /** Deletes a lesson that was never published; a published one is archived instead (its versions stay). */
    async remove(actor: Actor, lessonId: string): Promise<void> {
      const lesson = await loadEditableLesson(db, actor, lessonId);
      await db.transaction(async (trx) => {
        const locked = await repo.lockLesson(trx, lesson.schoolId, lesson.id);
        if (!locked) throw new NotFoundError('That lesson');
        if (locked.latestVersion !== null) {
          throw new ConflictError(
            'lesson_published',
            `“${locked.title}” has published versions, so it cannot be deleted; archive it instead.`,
          );
        }
        await repo.deleteLesson(trx, lesson.schoolId, lesson.id);
        await recordLessonAudit(trx, {
          schoolId: lesson.schoolId,
          actorId: actor.userId,
          action: 'lesson_deleted',
          lessonId: lesson.id,
          title: locked.title,
        });
      });
    },

    /**
     * Copies a lesson's draft into the caller's own library: a new draft in the caller's department,
     * not shared, every checkpoint and chapter under a new key.
     */
    async duplicate(actor: Actor, lessonId: string): Promise<LessonDto> {
      const lesson = await loadViewableLesson(db, actor, lessonId);
      if (!canDuplicateLesson(actor, lesson))
        throw new ForbiddenError('Only teachers and substitute teachers can copy a lesson into their library.');
      const source = await read.findLessonDetail(db, lesson.schoolId, lesson.id);
      if (!source) throw new NotFoundError('That lesson');
      const id = await repo.insertLesson(db, {
        schoolId: lesson.schoolId,
        ownerId: actor.userId,
        departmentId: actor.active.departmentId,
        recordingId: source.recordingId,
        content: duplicateContent(source.draft, copyTitle(source.draft.settings.title)),
        copiedFromId: source.id,
      });
      return present(actor, id);
    },
  };
}

export type LessonsService = ReturnType<typeof createLessonsService>;

/** Everything the lessons routes need, built from the app's dependencies (one line in app.ts). */
export function createLessonsServices(deps: { db: Knex; storage: ObjectStorage; playbackMinutes: number }) {
  const urls = createMediaUrls(deps.storage, deps.playbackMinutes);
  return {
    lessons: createLessonsService({ db: deps.db, urls }),
    drafts: createLessonDraftsService({ db: deps.db }),
    media: createLessonMediaService({ db: deps.db, media: createRecordingMediaService({ ...deps, urls }) }),
  };
}
