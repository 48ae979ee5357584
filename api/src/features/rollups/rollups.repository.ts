import type { Db } from '../../db/knex';

/**
 * The rollups the results pages read instead of raw rows, each recomputed whole from the raw rows
 * of what changed (so a rollup never drifts, whatever order changes arrive in).
 */

export interface RollupMark {
  lastGradeId: number;
  lastViewingAt: Date;
}

export const MARK_NAME = 'main';

/** The mark row, locked for this pass; undefined when another worker holds it (it is doing the pass). */
export async function lockMark(trx: Db): Promise<RollupMark | undefined> {
  await trx('rollup_marks').insert({ name: MARK_NAME }).onConflict('name').ignore();
  const row = await trx('rollup_marks')
    .where({ name: MARK_NAME })
    .forUpdate()
    .skipLocked()
    .first<{ last_grade_id: number; last_viewing_at: Date } | undefined>('last_grade_id', 'last_viewing_at');
  return row && { lastGradeId: row.last_grade_id, lastViewingAt: row.last_viewing_at };
}

export async function saveMark(trx: Db, mark: RollupMark): Promise<void> {
  await trx('rollup_marks').where({ name: MARK_NAME }).update({ last_grade_id: mark.lastGradeId, last_viewing_at: mark.lastViewingAt });
}

/** The checkpoints (by assignment) with a grade of id in (after, upTo]. */
export async function checkpointsGradedBetween(db: Db, after: number, upTo: number): Promise<Map<string, string[]>> {
  const rows = await db('grades')
    .where('id', '>', after)
    .andWhere('id', '<=', upTo)
    .distinct<{ assignment_id: string; checkpoint_key: string }[]>('assignment_id', 'checkpoint_key');
  const byAssignment = new Map<string, string[]>();
  for (const row of rows) byAssignment.set(row.assignment_id, [...(byAssignment.get(row.assignment_id) ?? []), row.checkpoint_key]);
  return byAssignment;
}

/**
 * Per checkpoint, from each response's latest grade (explanations of a prediction left out):
 * attempts, students, students right at their first attempt, students whose latest answer is
 * right, detected mistakes over all attempts, and the spread of latest answers as written.
 */
export async function recomputeCheckpointRollups(db: Db, assignmentId: string, checkpointKeys: string[]): Promise<void> {
  await db.raw(
    `WITH latest AS (
       SELECT DISTINCT ON (g.response_id) g.response_id, g.correct, g.mistake
       FROM grades g WHERE g.assignment_id = :assignmentId AND g.checkpoint_key = ANY(:keys)
       ORDER BY g.response_id, g.id DESC
     ), answers AS (
       SELECT r.checkpoint_key, r.student_id, r.attempt, r.raw_text, l.correct, l.mistake,
              row_number() OVER (PARTITION BY r.checkpoint_key, r.student_id ORDER BY r.attempt DESC) AS from_last
       FROM responses r JOIN latest l ON l.response_id = r.id
       WHERE r.assignment_id = :assignmentId AND r.checkpoint_key = ANY(:keys) AND NOT r.is_explanation
     ), per_checkpoint AS (
       SELECT checkpoint_key, count(*)::int AS attempts, count(DISTINCT student_id)::int AS students,
              count(*) FILTER (WHERE attempt = 1 AND correct)::int AS first_attempt_correct,
              count(*) FILTER (WHERE from_last = 1 AND correct)::int AS correct_students
       FROM answers GROUP BY checkpoint_key
     ), mistakes AS (
       SELECT checkpoint_key, jsonb_object_agg(mistake, n) AS mistakes
       FROM (SELECT checkpoint_key, mistake, count(*)::int AS n FROM answers WHERE mistake IS NOT NULL GROUP BY 1, 2) m
       GROUP BY checkpoint_key
     ), distribution AS (
       SELECT checkpoint_key, jsonb_object_agg(raw_text, n) AS distribution
       FROM (SELECT checkpoint_key, raw_text, count(*)::int AS n FROM answers WHERE from_last = 1 GROUP BY 1, 2) d
       GROUP BY checkpoint_key
     )
     INSERT INTO checkpoint_rollups AS c (assignment_id, checkpoint_key, students, attempts, first_attempt_correct, correct_students,
                                          mistakes, distribution, computed_at)
     SELECT :assignmentId, p.checkpoint_key, p.students, p.attempts, p.first_attempt_correct, p.correct_students,
            COALESCE(m.mistakes, '{}'::jsonb), COALESCE(d.distribution, '{}'::jsonb), now()
     FROM per_checkpoint p LEFT JOIN mistakes m USING (checkpoint_key) LEFT JOIN distribution d USING (checkpoint_key)
     ON CONFLICT (assignment_id, checkpoint_key) DO UPDATE SET
       students = EXCLUDED.students, attempts = EXCLUDED.attempts, first_attempt_correct = EXCLUDED.first_attempt_correct,
       correct_students = EXCLUDED.correct_students, mistakes = EXCLUDED.mistakes, distribution = EXCLUDED.distribution,
       computed_at = EXCLUDED.computed_at`,
    { assignmentId, keys: checkpointKeys },
  );
}

/** Assignments with a viewing report stored after `since`. */
export async function assignmentsViewedSince(db: Db, since: Date): Promise<string[]> {
  const rows = await db('student_progress').where('viewing_updated_at', '>', since).distinct<{ assignment_id: string }[]>('assignment_id');
  return rows.map((row) => row.assignment_id);
}

/** Every student's coverage of one assignment that has watched anything, and its recording's length. */
export async function coverageOf(db: Db, assignmentId: string): Promise<{ durationMs: number; bitsets: Uint8Array[] } | undefined> {
  const recording = await db('assignments as a')
    .join('lesson_versions as v', 'v.id', 'a.lesson_version_id')
    .join('recordings as r', 'r.id', 'v.recording_id')
    .where('a.id', assignmentId)
    .first<{ duration_seconds: number | null } | undefined>('r.duration_seconds');
  if (!recording) return undefined;
  const rows = await db('student_progress')
    .where({ assignment_id: assignmentId })
    .andWhere('watched_seconds', '>', 0)
    .select<{ coverage: Buffer }[]>('coverage');
  return { durationMs: Math.round((recording.duration_seconds ?? 0) * 1000), bitsets: rows.map((row) => row.coverage) };
}

export async function saveViewingRollup(db: Db, assignmentId: string, students: number, audience: number[]): Promise<void> {
  await db('viewing_rollups')
    .insert({ assignment_id: assignmentId, students, audience, computed_at: db.fn.now() })
    .onConflict('assignment_id')
    .merge(['students', 'audience', 'computed_at']);
}
