import type { Db } from '../../db/knex';
import type { LessonContent, VersionChanges } from '@core/contracts';
import { contentHash, distinctTags } from './lesson-content';

/** The columns a saved draft writes: the draft, its hash and the copies lists and search read. */
function draftColumns(content: LessonContent) {
  return {
    draft: JSON.stringify(content),
    draft_hash: contentHash(content),
    title: content.settings.title,
    tags: distinctTags(content),
    level: content.settings.level,
    checkpoint_count: content.checkpoints.length,
  };
}

export interface NewLesson {
  schoolId: string;
  ownerId: string;
  departmentId: string | null;
  recordingId: string;
  content: LessonContent;
  copiedFromId: string | null;
}

/** Inserts a lesson at revision 0, never shared, never published; returns its id. */
export async function insertLesson(db: Db, lesson: NewLesson): Promise<string> {
  const [row] = await db('lessons')
    .insert({
      school_id: lesson.schoolId,
      owner_id: lesson.ownerId,
      department_id: lesson.departmentId,
      recording_id: lesson.recordingId,
      copied_from_id: lesson.copiedFromId,
      saved_by: lesson.ownerId,
      ...draftColumns(lesson.content),
    })
    .returning('id');
  return (row as { id: string }).id;
}

/**
 * Saves a whole draft only if nobody saved since `revision` (one conditional UPDATE, so two tabs
 * can never both pass); bumps the revision. Returns the new revision, or undefined on a conflict.
 */
export async function saveDraft(
  db: Db,
  save: { schoolId: string; lessonId: string; revision: number; content: LessonContent; savedBy: string },
): Promise<{ revision: number; savedAt: Date; draftHash: string } | undefined> {
  const [row] = await db('lessons')
    .where({ id: save.lessonId, school_id: save.schoolId, revision: save.revision })
    .update({
      ...draftColumns(save.content),
      revision: db.raw('revision + 1'),
      saved_at: db.fn.now(),
      saved_by: save.savedBy,
      updated_at: db.fn.now(),
    })
    .returning(['revision', 'saved_at as savedAt', 'draft_hash as draftHash']);
  return row as { revision: number; savedAt: Date; draftHash: string } | undefined;
}

/** Who saved the stored revision, and when (the details of a 409 edit_conflict). */
export async function findSaveFacts(
  db: Db,
  schoolId: string,
  lessonId: string,
): Promise<{ revision: number; savedAt: Date; savedBy: string | null } | undefined> {
  return db('lessons as l')
    .leftJoin('users as u', 'u.id', 'l.saved_by')
    .where({ 'l.id': lessonId, 'l.school_id': schoolId })
    .first('l.revision', 'l.saved_at as savedAt', 'u.name as savedBy');
}

export interface LockedLesson {
  id: string;
  title: string;
  revision: number;
  draft: LessonContent;
  latestVersion: number | null;
  recordingId: string;
}

/** Locks one lesson of one school for the rest of the transaction (publishes and deletes run one at a time). */
export async function lockLesson(db: Db, schoolId: string, lessonId: string): Promise<LockedLesson | undefined> {
  return db('lessons')
    .where({ id: lessonId, school_id: schoolId })
    .forUpdate()
    .first('id', 'title', 'revision', 'draft', 'latest_version as latestVersion', 'recording_id as recordingId');
}

/** The frozen content of a lesson's version (the previous one a publish diffs against). */
export async function findVersionContent(
  db: Db,
  lessonId: string,
  number: number,
): Promise<{ content: LessonContent; contentHash: string } | undefined> {
  return db('lesson_versions').where({ lesson_id: lessonId, number }).first('content', 'content_hash as contentHash');
}

/** Appends a version (rows are never updated) and points the lesson at it. Returns the version's id. */
export async function insertVersion(
  db: Db,
  version: {
    schoolId: string;
    lessonId: string;
    number: number;
    content: LessonContent;
    changes: VersionChanges;
    note: string;
    recordingId: string;
    publishedBy: string;
  },
): Promise<string> {
  const [row] = await db('lesson_versions')
    .insert({
      lesson_id: version.lessonId,
      number: version.number,
      content: JSON.stringify(version.content),
      content_hash: contentHash(version.content),
      changes: JSON.stringify(version.changes),
      note: version.note,
      checkpoint_count: version.content.checkpoints.length,
      recording_id: version.recordingId,
      published_by: version.publishedBy,
    })
    .returning('id');
  await db('lessons')
    .where({ id: version.lessonId, school_id: version.schoolId })
    .update({ latest_version: version.number, updated_at: db.fn.now() });
  return (row as { id: string }).id;
}

/** Sharing and archiving; `undefined` leaves a flag alone. Archiving again keeps the first date. */
export async function updateFlags(
  db: Db,
  schoolId: string,
  lessonId: string,
  flags: { shared?: boolean; archived?: boolean },
): Promise<void> {
  await db('lessons')
    .where({ id: lessonId, school_id: schoolId })
    .update({
      ...(flags.shared === undefined ? {} : { shared: flags.shared }),
      ...(flags.archived === undefined ? {} : { archived_at: flags.archived ? db.raw('coalesce(archived_at, now())') : null }),
      updated_at: db.fn.now(),
    });
}

export async function deleteLesson(db: Db, schoolId: string, lessonId: string): Promise<number> {
  return db('lessons').where({ id: lessonId, school_id: schoolId }).delete();
}
