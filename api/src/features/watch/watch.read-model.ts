import type { CheckpointAnswer, CheckpointGradeDto } from '@core/contracts';
import type { Db } from '../../db/knex';

/** One student's row of an assignment (absent until they first open it, acknowledge or answer). */
export interface ProgressRow {
  assignmentId: string;
  firstOpenedAt: Date | null;
  safetyAcknowledgedAt: Date | null;
  positionMs: number;
  coverage: Uint8Array;
  watchedSeconds: number;
  completedAt: Date | null;
  resultsSeenAt: Date | null;
  gradeUpdatedAt: Date | null;
}

export const PROGRESS_COLUMNS = [
  'assignment_id as assignmentId',
  'first_opened_at as firstOpenedAt',
  'safety_acknowledged_at as safetyAcknowledgedAt',
  'position_ms as positionMs',
  'coverage',
  'watched_seconds as watchedSeconds',
  'completed_at as completedAt',
  'results_seen_at as resultsSeenAt',
  'grade_updated_at as gradeUpdatedAt',
];

/** One recorded answer with its latest grade (the latest counts: engine, regrade or teacher). */
export interface StoredResponse {
  id: string;
  checkpointKey: string;
  attempt: number;
  answer: CheckpointAnswer;
  isExplanation: boolean;
  receivedAt: Date;
  late: boolean;
  sentAfterReconnecting: boolean;
  grade: CheckpointGradeDto | null;
  gradeSource: 'engine' | 'regrade' | 'teacher' | null;
  gradedAt: Date | null;
}

/**
 * Ids of the assignments of the student's classes in one school (archived classes left out),
 * soonest due first.
 */
export async function listAssignedIds(db: Db, schoolId: string, studentId: string): Promise<string[]> {
  const rows = await db('assignments as a')
    .join('enrolments as e', function joinEnrolment() {
      this.on('e.class_id', 'a.class_id').andOnVal('e.student_id', '=', studentId);
    })
    .join('classes as c', 'c.id', 'a.class_id')
    .where({ 'a.school_id': schoolId, 'c.school_id': schoolId })
    .whereNull('c.archived_at')
    .orderBy([{ column: 'a.due_at' }, { column: 'a.id' }])
    .select<{ id: string }[]>('a.id');
  return rows.map((row) => row.id);
}

/** The student's progress rows of these assignments, by assignment id. */
export async function listProgress(
  db: Db,
  schoolId: string,
  studentId: string,
  assignmentIds: string[],
): Promise<Map<string, ProgressRow>> {
  if (assignmentIds.length === 0) return new Map();
  const rows = await db('student_progress')
    .where({ school_id: schoolId, student_id: studentId })
    .whereIn('assignment_id', assignmentIds)
    .select<ProgressRow[]>(PROGRESS_COLUMNS);
  return new Map(rows.map((row) => [row.assignmentId, row]));
}

export async function findProgress(db: Db, schoolId: string, assignmentId: string, studentId: string): Promise<ProgressRow | undefined> {
  return db('student_progress')
    .where({ school_id: schoolId, assignment_id: assignmentId, student_id: studentId })
    .first<ProgressRow | undefined>(PROGRESS_COLUMNS);
}

/** The checkpoint keys the student has a recorded answer at, by assignment id. */
export async function listAnsweredKeys(
  db: Db,
  schoolId: string,
  studentId: string,
  assignmentIds: string[],
): Promise<Map<string, Set<string>>> {
  const answered = new Map<string, Set<string>>();
  if (assignmentIds.length === 0) return answered;
  const rows = await db('responses')
    .where({ school_id: schoolId, student_id: studentId })
    .whereIn('assignment_id', assignmentIds)
    .distinct<{ assignmentId: string; checkpointKey: string }[]>('assignment_id as assignmentId', 'checkpoint_key as checkpointKey');
  for (const row of rows) {
    const keys = answered.get(row.assignmentId) ?? new Set<string>();
    keys.add(row.checkpointKey);
    answered.set(row.assignmentId, keys);
  }
  return answered;
}

/** Poster object keys of recordings of one school, by recording id (null before processing made one). */
export async function listPosterKeys(db: Db, schoolId: string, recordingIds: string[]): Promise<Map<string, string | null>> {
  if (recordingIds.length === 0) return new Map();
  const rows = await db('recordings')
    .where({ school_id: schoolId })
    .whereIn('id', [...new Set(recordingIds)])
    .select<{ id: string; posterKey: string | null }[]>('id', 'poster_key as posterKey');
  return new Map(rows.map((row) => [row.id, row.posterKey]));
}

/** Every answer the student recorded in one assignment, in attempt order per checkpoint, each with its latest grade. */
export async function listStudentResponses(db: Db, schoolId: string, assignmentId: string, studentId: string): Promise<StoredResponse[]> {
  return db('responses as r')
    .joinRaw(
      `LEFT JOIN LATERAL (
        SELECT g.detail, g.source, g.graded_at FROM grades g WHERE g.response_id = r.id ORDER BY g.id DESC LIMIT 1
      ) AS g ON true`,
    )
    .where({ 'r.school_id': schoolId, 'r.assignment_id': assignmentId, 'r.student_id': studentId })
    .orderBy([{ column: 'r.checkpoint_key' }, { column: 'r.attempt' }])
    .select<StoredResponse[]>(
      'r.id',
      'r.checkpoint_key as checkpointKey',
      'r.attempt',
      'r.answer',
      'r.is_explanation as isExplanation',
      'r.received_at as receivedAt',
      'r.late',
      'r.sent_after_reconnecting as sentAfterReconnecting',
      'g.detail as grade',
      'g.source as gradeSource',
      'g.graded_at as gradedAt',
    );
}

/** Responses grouped by checkpoint key, each group in attempt order. */
export function byCheckpoint(responses: StoredResponse[]): Map<string, StoredResponse[]> {
  const groups = new Map<string, StoredResponse[]>();
  for (const response of responses) {
    const group = groups.get(response.checkpointKey) ?? [];
    group.push(response);
    groups.set(response.checkpointKey, group);
  }
  return groups;
}
