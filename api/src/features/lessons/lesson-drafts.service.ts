import type { Knex } from 'knex';
import type { DraftSave, DraftSavedDto, Publish, VersionDto, VersionSummaryDto } from '@core/contracts';
import { diffContent } from '@core/lessons';
import type { Actor } from '../../auth/actor';
import type { Db } from '../../db/knex';
import { ConflictError, NotFoundError, ValidationError } from '../../errors';
import { loadEditableLesson, loadViewableLesson } from './lesson-access';
import * as repo from './lessons.repository';
import * as read from './lessons.read-model';
import * as versions from './lesson-versions.read-model';
import { contentHash, problemsOf } from './lesson-content';
import { hasUnpublishedChanges, presentVersion, presentVersionSummary, recordingFactsOf } from './lessons.presenter';
import { recordLessonAudit } from './lesson-audit.repository';
import { EditConflictError } from './lesson-errors';

/** The 409 for an edit that started from an older revision, naming the newer save. */
async function conflictOn(db: Db, schoolId: string, lessonId: string): Promise<EditConflictError> {
  const facts = await repo.findSaveFacts(db, schoolId, lessonId);
  if (!facts) throw new NotFoundError('That lesson');
  return new EditConflictError({ revision: facts.revision, savedAt: new Date(facts.savedAt).toISOString(), savedBy: facts.savedBy });
}

async function viewOf(db: Db, schoolId: string, lessonId: string): Promise<read.LessonView> {
  const view = await read.findLessonView(db, schoolId, lessonId);
  if (!view) throw new NotFoundError('That lesson');
  return view;
}

/** Saving drafts whole (autosave), publishing immutable versions, and reading them back. */
export function createLessonDraftsService({ db }: { db: Knex }) {
  return {
    /**
     * Saves the whole draft if it started from the stored revision (else 409 edit_conflict). A draft
     * with problems is still saved, so no typing is lost; the answer lists them.
     */
    async save(actor: Actor, lessonId: string, input: DraftSave): Promise<DraftSavedDto> {
      const lesson = await loadEditableLesson(db, actor, lessonId);
      const saved = await repo.saveDraft(db, {
        schoolId: lesson.schoolId,
        lessonId: lesson.id,
        revision: input.revision,
        content: input.content,
        savedBy: actor.userId,
      });
      if (!saved) throw await conflictOn(db, lesson.schoolId, lesson.id);
      const view = await viewOf(db, lesson.schoolId, lesson.id);
      return {
        revision: saved.revision,
        savedAt: new Date(saved.savedAt).toISOString(),
        problems: problemsOf(input.content, recordingFactsOf(view)),
        unpublishedChanges: hasUnpublishedChanges({ draftHash: saved.draftHash, latestHash: view.latestHash }),
      };
    },

    /**
     * Freezes the stored draft as the next version, with what changed since the previous one. The
     * lesson stays locked from the revision check to the new version, so two publishes never race.
     */
    async publish(actor: Actor, lessonId: string, input: Publish): Promise<VersionSummaryDto> {
      const lesson = await loadEditableLesson(db, actor, lessonId);
      const number = await db.transaction(async (trx) => {
        const locked = await repo.lockLesson(trx, lesson.schoolId, lesson.id);
        if (!locked) throw new NotFoundError('That lesson');
        if (locked.revision !== input.revision) throw await conflictOn(trx, lesson.schoolId, lesson.id);
        const problems = problemsOf(locked.draft, recordingFactsOf(await viewOf(trx, lesson.schoolId, lesson.id)));
        const [first] = problems;
        if (first) {
          const more = problems.length > 1 ? ` (and ${problems.length - 1} more)` : '';
          const message = `Fix the lesson’s problems before publishing: ${first.message}${more}`;
          throw new ValidationError(message, problems, 'lesson_not_ready');
        }
        const previous = locked.latestVersion === null ? undefined : await repo.findVersionContent(trx, lesson.id, locked.latestVersion);
        if (previous && previous.contentHash === contentHash(locked.draft)) {
          throw new ConflictError(
            'nothing_to_publish',
            `Nothing has changed since version ${locked.latestVersion} was published. Edit the lesson, then publish again.`,
          );
        }
        const next = (locked.latestVersion ?? 0) + 1;
        await repo.insertVersion(trx, {
          schoolId: lesson.schoolId,
          lessonId: lesson.id,
          number: next,
          content: locked.draft,
          changes: diffContent(previous?.content ?? null, locked.draft),
          note: input.note,
          recordingId: locked.recordingId,
          publishedBy: actor.userId,
        });
        await recordLessonAudit(trx, {
          schoolId: lesson.schoolId,
          actorId: actor.userId,
          action: 'lesson_published',
          lessonId: lesson.id,
          title: locked.title,
          data: { version: next },
        });
        return next;
      });
      const version = await versions.findVersion(db, lesson.id, number);
      if (!version) throw new NotFoundError('That version');
      return presentVersionSummary(version);
    },

    async versions(actor: Actor, lessonId: string): Promise<{ versions: VersionSummaryDto[] }> {
      const lesson = await loadViewableLesson(db, actor, lessonId);
      return { versions: (await versions.listVersions(db, lesson.id)).map(presentVersionSummary) };
    },

    async version(actor: Actor, lessonId: string, number: number): Promise<VersionDto> {
      const lesson = await loadViewableLesson(db, actor, lessonId);
      const version = await versions.findVersion(db, lesson.id, number);
      if (!version) throw new NotFoundError(`Version ${number} of this lesson`);
      return presentVersion(version);
    },
  };
}

export type LessonDraftsService = ReturnType<typeof createLessonDraftsService>;
