import { z } from 'zod';
import type { LessonContent } from '@core/contracts';
import type { Db } from '../../db/knex';
import type { Actor } from '../../auth/actor';
import { NotFoundError } from '../../errors';
import { loadViewableLesson } from './lesson-access';
import { canEditLesson } from './lessons.policy';
import { findLessonDetail } from './lessons.read-model';
import { findVersion } from './lesson-versions.read-model';

/** `?version=N` on exports and tracks: a published version's number. */
export const VersionQuerySchema = z.object({
  version: z.coerce
    .number({ error: 'The version is a number, like ?version=2.' })
    .int({ error: 'The version is a whole number, like ?version=2.' })
    .min(1, { error: 'Versions are numbered from 1.' })
    .optional(),
});
export type VersionQuery = z.infer<typeof VersionQuerySchema>;

/** One lesson's content as the caller may read it, with the facts of its recording. */
export interface LessonContentView {
  lessonId: string;
  /** The draft, or the published version's number. */
  source: 'draft' | number;
  content: LessonContent;
  recording: { id: string; title: string; durationMs: number | null };
}

/**
 * Which content a caller gets when no version is named: editors work on the draft; everyone else
 * reads the newest published version, or the draft of a lesson never published (shared drafts are
 * readable to colleagues, as the lesson page shows them).
 */
export async function loadLessonContent(
  db: Db,
  actor: Actor,
  lessonId: string,
  wanted: { version?: number; draft?: boolean } = {},
): Promise<LessonContentView> {
  const access = await loadViewableLesson(db, actor, lessonId);
  const lesson = await findLessonDetail(db, access.schoolId, access.id);
  if (!lesson) throw new NotFoundError('That lesson');
  const recording = {
    id: lesson.recordingId,
    title: lesson.recordingTitle,
    durationMs: lesson.recordingDurationSeconds === null ? null : Math.round(lesson.recordingDurationSeconds * 1000),
  };
  const number = wanted.draft
    ? undefined
    : (wanted.version ?? (canEditLesson(actor, access) ? undefined : (lesson.latestVersion ?? undefined)));
  if (number === undefined) return { lessonId: lesson.id, source: 'draft', content: lesson.draft, recording };
  // Versions are found only through the lesson loaded for the caller's school above.
  const version = await findVersion(db, lesson.id, number);
  if (!version) throw new NotFoundError(`Version ${number} of “${lesson.title}”`);
  return { lessonId: lesson.id, source: number, content: version.content, recording };
}
