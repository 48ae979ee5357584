import type { CheckpointAnswer, CheckpointGradeDto } from '@core/contracts';
import type { VariableValues } from '@core/physics/units/types';
import { array, bool, instant, json, number, text } from './sql-literals';

/**
 * The SQL of one group commit. Every statement takes the whole batch at once (arrays through
 * unnest), and the statements travel in two round trips: BEGIN with the lock and the read, then the
 * insert with the COMMIT. Values are written as literals (sql-literals.ts): the simple query
 * protocol that carries several statements at once takes no parameters.
 */

export interface PairKey {
  assignmentId: string;
  studentId: string;
  schoolId: string;
  classId: string;
}

export interface LockedProgress {
  assignmentId: string;
  studentId: string;
  watchedSeconds: number;
  completedAt: Date | null;
  /** The student's last visit to their results (which may show answers once the lesson closed). */
  resultsSeenAt: Date | null;
}

export const pairKey = (assignmentId: string, studentId: string) => `${assignmentId}:${studentId}`;

/**
 * Creates the progress rows that are missing and locks them all, in one sorted statement (so two
 * batches never wait on each other in a circle). Only students still enrolled in the assignment's
 * class get a row back: the enrolment is checked here, inside the transaction, whatever a cache said.
 */
export function lockProgressSql(pairs: PairKey[]): string {
  const sorted = [...pairs].sort((a, b) => pairKey(a.assignmentId, a.studentId).localeCompare(pairKey(b.assignmentId, b.studentId)));
  const uuids = (pick: (p: PairKey) => string) => array(sorted.map(pick), text, 'uuid');
  return `INSERT INTO student_progress (assignment_id, student_id, school_id)
    SELECT u.a, u.s, u.sch FROM unnest(${uuids((p) => p.assignmentId)}, ${uuids((p) => p.studentId)}, ${uuids((p) => p.schoolId)},
                                       ${uuids((p) => p.classId)}) WITH ORDINALITY AS u(a, s, sch, c, n)
    WHERE EXISTS (SELECT 1 FROM enrolments e WHERE e.class_id = u.c AND e.student_id = u.s)
    ORDER BY u.n
    ON CONFLICT (assignment_id, student_id) DO UPDATE SET updated_at = now()
    RETURNING assignment_id AS "assignmentId", student_id AS "studentId", watched_seconds AS "watchedSeconds", completed_at AS "completedAt",
      results_seen_at AS "resultsSeenAt"`;
}

/**
 * The assignments' versions as committed now, read after the progress locks: a move to a corrected
 * version that committed while this batch waited shows here, and answers planned with the old
 * version are planned again.
 */
export function assignmentVersionsSql(assignmentIds: string[]): string {
  return `SELECT id, version_number AS "versionNumber" FROM assignments WHERE id = ANY(${array([...new Set(assignmentIds)], text, 'uuid')})`;
}

export interface StateQuery {
  assignmentId: string;
  studentId: string;
  checkpointKey: string;
  idempotencyKey: string;
}

/** A stored answer found again by its idempotency key, with its latest grade. */
export interface StoredRepeat {
  id: string;
  assignmentId: string;
  checkpointKey: string;
  attempt: number;
  requestHash: string;
  late: boolean;
  sentAfterReconnecting: boolean;
  receivedAt: Date;
  detail: CheckpointGradeDto;
}

/** What the server knows, under the lock, about one submission's student and checkpoint. */
export interface SubmitState {
  /** Attempts used at the checkpoint (explanations of a prediction do not count). */
  used: number;
  /** The highest attempt number at the checkpoint, explanations included (0: none). */
  lastAttempt: number;
  lastAnswer: CheckpointAnswer | null;
  /** The latest grade of the latest answer at the checkpoint. */
  lastCorrect: boolean | null;
  /** Checkpoint keys of the assignment with a recorded answer of this student. */
  answeredKeys: string[];
  repeat: StoredRepeat | null;
}

export interface StateRow {
  used: number;
  lastAttempt: number;
  lastAnswer: CheckpointAnswer | null;
  lastCorrect: boolean | null;
  answeredKeys: string[] | null;
  repId: string | null;
  repAssignmentId: string;
  repCheckpointKey: string;
  repAttempt: number;
  repHash: string;
  repLate: boolean;
  repSentAfterReconnecting: boolean;
  repReceivedAt: Date;
  repDetail: CheckpointGradeDto;
}

/**
 * One row per query, in order: counts, the last answer, the answered keys and a stored repeat of the
 * key. Run after the lock statement, as its own statement: its snapshot sees every answer committed
 * by whoever held the lock before.
 */
export function submitStateSql(queries: StateQuery[]): string {
  const col = (pick: (q: StateQuery) => string, type: string) => array(queries.map(pick), text, type);
  return `SELECT COALESCE(s.used, 0)::int AS used, COALESCE(s.last_attempt, 0)::int AS "lastAttempt",
           l.answer AS "lastAnswer", l.correct AS "lastCorrect", k.keys AS "answeredKeys",
           rep.id AS "repId", rep.assignment_id AS "repAssignmentId", rep.checkpoint_key AS "repCheckpointKey",
           rep.attempt AS "repAttempt", rep.request_hash AS "repHash", rep.late AS "repLate",
           rep.sent_after_reconnecting AS "repSentAfterReconnecting", rep.received_at AS "repReceivedAt", rep.detail AS "repDetail"
    FROM unnest(${col((q) => q.assignmentId, 'uuid')}, ${col((q) => q.studentId, 'uuid')}, ${col((q) => q.checkpointKey, 'text')},
                ${col((q) => q.idempotencyKey, 'uuid')}) WITH ORDINALITY AS i(a, s, k, idem, n)
    LEFT JOIN LATERAL (
      SELECT count(*) FILTER (WHERE NOT r.is_explanation) AS used, max(r.attempt) AS last_attempt
      FROM responses r WHERE r.assignment_id = i.a AND r.student_id = i.s AND r.checkpoint_key = i.k
    ) s ON true
    LEFT JOIN LATERAL (
      SELECT r.answer, (SELECT g.correct FROM grades g WHERE g.response_id = r.id ORDER BY g.id DESC LIMIT 1) AS correct
      FROM responses r WHERE r.assignment_id = i.a AND r.student_id = i.s AND r.checkpoint_key = i.k
      ORDER BY r.attempt DESC LIMIT 1
    ) l ON true
    LEFT JOIN LATERAL (
      SELECT array_agg(DISTINCT r.checkpoint_key) AS keys FROM responses r WHERE r.assignment_id = i.a AND r.student_id = i.s
    ) k ON true
    LEFT JOIN LATERAL (
      SELECT r.*, (SELECT g.detail FROM grades g WHERE g.response_id = r.id ORDER BY g.id DESC LIMIT 1) AS detail
      FROM responses r WHERE r.student_id = i.s AND r.idempotency_key = i.idem
    ) rep ON true
    ORDER BY i.n`;
}

export function toSubmitState(row: StateRow): SubmitState {
  return {
    used: row.used,
    lastAttempt: row.lastAttempt,
    lastAnswer: row.lastAnswer,
    lastCorrect: row.lastCorrect,
    answeredKeys: row.answeredKeys ?? [],
    repeat:
      row.repId === null
        ? null
        : {
            id: row.repId,
            assignmentId: row.repAssignmentId,
            checkpointKey: row.repCheckpointKey,
            attempt: row.repAttempt,
            requestHash: row.repHash,
            late: row.repLate,
            sentAfterReconnecting: row.repSentAfterReconnecting,
            receivedAt: row.repReceivedAt,
            detail: row.repDetail,
          },
  };
}

/** One answer to record with its engine grade. */
export interface NewResponse {
  id: string;
  schoolId: string;
  assignmentId: string;
  studentId: string;
  checkpointKey: string;
  versionNumber: number;
  attempt: number;
  idempotencyKey: string;
  requestHash: string;
  answer: CheckpointAnswer;
  rawText: string;
  parsedSi: number | null;
  variables: VariableValues | null;
  isExplanation: boolean;
  answeredAt: Date;
  receivedAt: Date;
  late: boolean;
  sentAfterReconnecting: boolean;
  grade: CheckpointGradeDto;
}

export interface Completed {
  assignmentId: string;
  studentId: string;
  at: Date;
}

/**
 * Inserts the responses, their engine grades and the first completion stamps in one statement
 * (data-modifying CTEs): the grades join the inserted rows, so each grade has its response.
 * Null when there is nothing to write.
 */
export function insertResponsesSql(responses: NewResponse[], completed: Completed[]): string | null {
  if (responses.length === 0 && completed.length === 0) return null;
  const col = <T>(pick: (r: NewResponse) => T, literal: (value: T) => string, type: string) => array(responses.map(pick), literal, type);
  const done = <T>(pick: (c: Completed) => T, literal: (value: T) => string, type: string) => array(completed.map(pick), literal, type);
  return `WITH ins AS (
      INSERT INTO responses (id, school_id, assignment_id, student_id, checkpoint_key, version_number, attempt, idempotency_key,
                             request_hash, answer, raw_text, parsed_si, variables, is_explanation, answered_at, received_at, late,
                             sent_after_reconnecting)
      SELECT * FROM unnest(${col((r) => r.id, text, 'uuid')}, ${col((r) => r.schoolId, text, 'uuid')}, ${col((r) => r.assignmentId, text, 'uuid')},
        ${col((r) => r.studentId, text, 'uuid')}, ${col((r) => r.checkpointKey, text, 'text')}, ${col((r) => r.versionNumber, number, 'int')},
        ${col((r) => r.attempt, number, 'int')}, ${col((r) => r.idempotencyKey, text, 'uuid')}, ${col((r) => r.requestHash, text, 'text')},
        ${col((r) => r.answer, json, 'jsonb')}, ${col((r) => r.rawText, text, 'text')}, ${col((r) => r.parsedSi, number, 'float8')},
        ${col((r) => r.variables, json, 'jsonb')}, ${col((r) => r.isExplanation, bool, 'bool')}, ${col((r) => r.answeredAt, instant, 'timestamptz')},
        ${col((r) => r.receivedAt, instant, 'timestamptz')}, ${col((r) => r.late, bool, 'bool')}, ${col((r) => r.sentAfterReconnecting, bool, 'bool')})
      RETURNING id, assignment_id, checkpoint_key, version_number
    ), done AS (
      UPDATE student_progress p SET completed_at = d.at
      FROM unnest(${done((c) => c.assignmentId, text, 'uuid')}, ${done((c) => c.studentId, text, 'uuid')}, ${done((c) => c.at, instant, 'timestamptz')}) AS d(a, s, at)
      WHERE p.assignment_id = d.a AND p.student_id = d.s AND p.completed_at IS NULL
      RETURNING 1
    )
    INSERT INTO grades (response_id, assignment_id, checkpoint_key, score, correct, mistake, detail, source, version_number)
    SELECT ins.id, ins.assignment_id, ins.checkpoint_key, g.score, g.correct, g.mistake, g.detail, 'engine', ins.version_number
    FROM ins JOIN unnest(${col((r) => r.id, text, 'uuid')}, ${col((r) => r.grade.score, number, 'float8')}, ${col((r) => r.grade.correct, bool, 'bool')},
                         ${col((r) => r.grade.mistake, text, 'text')}, ${col((r) => r.grade, json, 'jsonb')}) AS g(id, score, correct, mistake, detail)
    ON g.id = ins.id`;
}
