import type { Db } from '../../db/knex';
import type { RegradeCandidate } from './regrade';

interface CandidateRow {
  responseId: string;
  studentId: string;
  checkpointKey: string;
  attempt: number;
  answer: RegradeCandidate['answer'];
  rawText: string;
  values: RegradeCandidate['values'];
  score: number | null;
  correct: boolean | null;
  mistake: string | null;
  source: string | null;
}

/**
 * Every response of an assignment at the given checkpoints, with the values its student was given
 * (the response's own copy, else the stored draw) and its latest grade, which is the one that counts.
 */
export async function listRegradeCandidates(db: Db, schoolId: string, assignmentId: string, keys: string[]): Promise<RegradeCandidate[]> {
  if (keys.length === 0) return [];
  const rows = await db('responses as r')
    .leftJoin('student_variables as sv', (join) =>
      join.on('sv.assignment_id', 'r.assignment_id').andOn('sv.student_id', 'r.student_id').andOn('sv.checkpoint_key', 'r.checkpoint_key'),
    )
    .joinRaw(
      'LEFT JOIN LATERAL (SELECT score, correct, mistake, source FROM grades WHERE grades.response_id = r.id ORDER BY grades.id DESC LIMIT 1) g ON true',
    )
    .where({ 'r.assignment_id': assignmentId, 'r.school_id': schoolId })
    .whereIn('r.checkpoint_key', keys)
    .orderBy(['r.student_id', 'r.checkpoint_key', 'r.attempt'])
    .select<CandidateRow[]>(
      'r.id as responseId',
      'r.student_id as studentId',
      'r.checkpoint_key as checkpointKey',
      'r.attempt',
      'r.answer',
      'r.raw_text as rawText',
      db.raw('coalesce(r.variables, sv.values) AS "values"'),
      'g.score',
      'g.correct',
      'g.mistake',
      'g.source',
    );
  return rows.map(({ score, correct, mistake, source, ...row }) => ({
    ...row,
    latest: source === null || score === null ? null : { score, correct, mistake, source },
  }));
}
