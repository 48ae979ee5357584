import type { CheckpointGradeDto, FeedbackPolicy, RevealPolicy } from '@core/contracts';
import type { Db } from '../../db/knex';
import type { RegradeChange } from './regrade';

/** Dates as instants and the policies, as the table stores them. */
export interface AssignmentSettings {
  opensAt: Date;
  dueAt: Date;
  lateUntil: Date | null;
  feedback: FeedbackPolicy;
  reveal: RevealPolicy;
  completionWatchShare: number;
}

const settingsColumns = (s: AssignmentSettings) => ({
  opens_at: s.opensAt,
  due_at: s.dueAt,
  late_until: s.lateUntil,
  feedback: s.feedback,
  reveal: s.reveal,
  completion_watch_share: s.completionWatchShare,
});

/** Inserts one assignment per class (same version, dates and policies); returns their ids in the classes' order. */
export async function insertAssignments(
  db: Db,
  input: {
    schoolId: string;
    lessonId: string;
    versionId: string;
    versionNumber: number;
    createdBy: string;
    classIds: string[];
    settings: AssignmentSettings;
  },
): Promise<string[]> {
  const rows = await db('assignments')
    .insert(
      input.classIds.map((classId) => ({
        school_id: input.schoolId,
        lesson_id: input.lessonId,
        lesson_version_id: input.versionId,
        version_number: input.versionNumber,
        class_id: classId,
        created_by: input.createdBy,
        ...settingsColumns(input.settings),
      })),
    )
    .returning<{ id: string; class_id: string }[]>(['id', 'class_id']);
  const byClass = new Map(rows.map((row) => [row.class_id, row.id]));
  return input.classIds.map((classId) => byClass.get(classId)!);
}

export interface LockedAssignment extends AssignmentSettings {
  id: string;
  lessonId: string;
  lessonVersionId: string;
  versionNumber: number;
  classId: string;
}

const LOCKED_COLUMNS = [
  'id',
  'lesson_id as lessonId',
  'lesson_version_id as lessonVersionId',
  'version_number as versionNumber',
  'class_id as classId',
  'opens_at as opensAt',
  'due_at as dueAt',
  'late_until as lateUntil',
  'feedback',
  'reveal',
  'completion_watch_share as completionWatchShare',
];

/**
 * Locks an assignment to change its dates and policies. NO KEY UPDATE, not UPDATE: a submit's
 * foreign-key checks take KEY SHARE on this row, and answering need not wait for a teacher's edit.
 */
export async function lockSettings(db: Db, schoolId: string, assignmentId: string): Promise<LockedAssignment | undefined> {
  return db('assignments')
    .where({ id: assignmentId, school_id: schoolId })
    .forNoKeyUpdate()
    .first<LockedAssignment | undefined>(LOCKED_COLUMNS);
}

/**
 * Locks an assignment against every answer, to move or delete it. First its progress rows: a
 * submit holds its student's row until its response commits, so this waits for those in flight.
 * Then the row itself FOR UPDATE, which waits for the foreign-key checks of first answers that
 * made their progress row meanwhile, and holds new ones back until commit. Submits take the same
 * two locks in the same order (progress row, then the key check), so the two never deadlock. Once
 * this returns, every response recorded so far is visible and no other can be recorded.
 */
export async function lockAgainstAnswers(db: Db, schoolId: string, assignmentId: string): Promise<LockedAssignment | undefined> {
  await db('student_progress')
    .where({ assignment_id: assignmentId, school_id: schoolId })
    .orderBy('student_id')
    .forUpdate()
    .select('student_id');
  return db('assignments').where({ id: assignmentId, school_id: schoolId }).forUpdate().first<LockedAssignment | undefined>(LOCKED_COLUMNS);
}

export async function updateSettings(db: Db, schoolId: string, assignmentId: string, settings: AssignmentSettings): Promise<void> {
  await db('assignments')
    .where({ id: assignmentId, school_id: schoolId })
    .update({ ...settingsColumns(settings), updated_at: db.fn.now() });
}

/** Points the assignment at another version and records the move with what its regrade did. */
export async function recordMove(
  db: Db,
  move: {
    schoolId: string;
    assignmentId: string;
    toVersionId: string;
    fromVersion: number;
    toVersion: number;
    changedKeys: string[];
    responsesRegraded: number;
    gradesChanged: number;
    movedBy: string;
  },
): Promise<void> {
  await db('assignments')
    .where({ id: move.assignmentId, school_id: move.schoolId })
    .update({ lesson_version_id: move.toVersionId, version_number: move.toVersion, updated_at: db.fn.now() });
  await db('assignment_version_moves').insert({
    assignment_id: move.assignmentId,
    from_version: move.fromVersion,
    to_version: move.toVersion,
    changed_keys: move.changedKeys,
    responses_regraded: move.responsesRegraded,
    grades_changed: move.gradesChanged,
    moved_by: move.movedBy,
  });
}

// The columns reports read, and the engine's whole reply as the student would have seen it.
const gradeRow = (grade: CheckpointGradeDto) => ({
  score: grade.score,
  correct: grade.correct,
  mistake: grade.mistake,
  detail: JSON.stringify(grade),
});

/** Appends a `regrade` grade for each changed response (grades are never updated), and tells its students. */
export async function insertRegrades(
  db: Db,
  input: { schoolId: string; assignmentId: string; toVersion: number; gradedBy: string; changes: RegradeChange[] },
): Promise<void> {
  if (input.changes.length === 0) return;
  await db('grades').insert(
    input.changes.map((change) => ({
      response_id: change.responseId,
      assignment_id: input.assignmentId,
      checkpoint_key: change.checkpointKey,
      ...gradeRow(change.grade),
      source: 'regrade',
      graded_by: input.gradedBy,
      version_number: input.toVersion,
    })),
  );
  const students = [...new Set(input.changes.map((change) => change.studentId))];
  await db('student_progress')
    .where({ assignment_id: input.assignmentId, school_id: input.schoolId })
    .whereIn('student_id', students)
    .update({ grade_updated_at: db.fn.now(), updated_at: db.fn.now() });
}

/** Deletes an assignment; its progress and drawn values go with it (callers checked it has no responses). */
export async function deleteAssignment(db: Db, schoolId: string, assignmentId: string): Promise<void> {
  await db('assignments').where({ id: assignmentId, school_id: schoolId }).delete();
}
