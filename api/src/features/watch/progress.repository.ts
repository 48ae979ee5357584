import type { Db } from '../../db/knex';
import { PROGRESS_COLUMNS, type ProgressRow } from './watch.read-model';

/** Which student_progress row: one per student and assignment. */
export interface ProgressKey {
  assignmentId: string;
  studentId: string;
  schoolId: string;
}

const rowOf = (key: ProgressKey) => ({ assignment_id: key.assignmentId, student_id: key.studentId, school_id: key.schoolId });

/**
 * Creates the row if missing and stamps the given moments only where they are still empty, in one
 * statement: a second open or acknowledgement keeps the first time.
 */
export async function stampProgress(
  db: Db,
  key: ProgressKey,
  stamps: { openedAt?: Date; safetyAcknowledgedAt?: Date; resultsSeenAt?: Date },
): Promise<ProgressRow> {
  const now = new Date();
  const firstOnly = (column: string) => db.raw(`COALESCE(student_progress.${column}, EXCLUDED.${column})`);
  const merge: Record<string, unknown> = { updated_at: now };
  if (stamps.openedAt) merge.first_opened_at = firstOnly('first_opened_at');
  if (stamps.safetyAcknowledgedAt) merge.safety_acknowledged_at = firstOnly('safety_acknowledged_at');
  // The results page is read again and again: this one moves with every visit.
  if (stamps.resultsSeenAt) merge.results_seen_at = stamps.resultsSeenAt;
  const [row] = await db('student_progress')
    .insert({
      ...rowOf(key),
      first_opened_at: stamps.openedAt ?? null,
      safety_acknowledged_at: stamps.safetyAcknowledgedAt ?? null,
      results_seen_at: stamps.resultsSeenAt ?? null,
    })
    .onConflict(['assignment_id', 'student_id'])
    .merge(merge)
    .returning(PROGRESS_COLUMNS);
  return row as ProgressRow;
}

/** The row under a lock for the rest of the transaction (created first if missing): answers and viewing reports queue on it. */
export async function lockProgress(trx: Db, key: ProgressKey): Promise<ProgressRow> {
  await trx('student_progress').insert(rowOf(key)).onConflict(['assignment_id', 'student_id']).ignore();
  const row = await trx('student_progress')
    .where({ school_id: key.schoolId, assignment_id: key.assignmentId, student_id: key.studentId })
    .forUpdate()
    .first<ProgressRow | undefined>(PROGRESS_COLUMNS);
  if (!row) throw new Error(`student_progress row missing after insert for assignment ${key.assignmentId}`);
  return row;
}

/** Writes merged viewing coverage and the resume point; `completedAt` only the first time the lesson is done. */
export async function saveViewing(
  trx: Db,
  key: ProgressKey,
  viewing: { coverage: Uint8Array; watchedSeconds: number; positionMs: number; viewedAt: Date; completedAt: Date | null },
): Promise<void> {
  await trx('student_progress')
    .where({ school_id: key.schoolId, assignment_id: key.assignmentId, student_id: key.studentId })
    .update({
      coverage: Buffer.from(viewing.coverage),
      watched_seconds: viewing.watchedSeconds,
      position_ms: viewing.positionMs,
      viewing_updated_at: viewing.viewedAt,
      updated_at: viewing.viewedAt,
      ...(viewing.completedAt ? { completed_at: trx.raw('COALESCE(completed_at, ?)', [viewing.completedAt]) } : {}),
    });
}
