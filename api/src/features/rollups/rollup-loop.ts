import type { Knex } from 'knex';
import type { Logger } from 'pino';
import { audience, recordingSeconds } from '@core/assignments';
import {
  assignmentsViewedSince,
  checkpointsGradedBetween,
  coverageOf,
  lockMark,
  recomputeCheckpointRollups,
  saveMark,
  saveViewingRollup,
} from './rollups.repository';

/** How often the worker brings the rollups up to date. */
export const ROLLUP_INTERVAL_MS = 5_000;
/**
 * Viewing reports are stamped with the API's clock before their transaction commits, so a report
 * may land with a time a little before the newest one already read: assignments viewed within this
 * long are looked at again on every pass (recomputing is idempotent).
 */
const VIEWING_LOOKBACK_MS = 60_000;

/** The highest grade id drawn so far, and a snapshot taken after it was read. */
interface GradeHorizon {
  upTo: number;
  snapshot: string;
}

export interface RollupPass {
  /** Another worker held the mark: it is doing this pass. */
  skipped: boolean;
  checkpoints: number;
  assignmentsViewed: number;
}

async function captureHorizon(db: Knex): Promise<GradeHorizon> {
  const { rows } = await db.raw<{ rows: { upTo: number }[] }>(
    'SELECT CASE WHEN is_called THEN last_value ELSE 0 END::bigint AS "upTo" FROM grades_id_seq',
  );
  // A separate, later statement: every transaction that drew an id up to `upTo` already had its
  // transaction id then, so it is finished or listed in this snapshot as running.
  const snap = await db.raw<{ rows: { snapshot: string }[] }>('SELECT pg_current_snapshot()::text AS snapshot');
  return { upTo: rows[0]?.upTo ?? 0, snapshot: snap.rows[0]!.snapshot };
}

/**
 * No transaction of this database that was running at the snapshot still is: every grade id up to
 * the horizon is committed or gone. (Transaction ids are cluster-wide; other databases' transactions
 * cannot write our grades and are not waited for. pg_stat_activity shows the 32-bit id.)
 */
async function settled(db: Knex, horizon: GradeHorizon): Promise<boolean> {
  const { rows } = await db.raw<{ rows: { settled: boolean }[] }>(
    `SELECT NOT EXISTS (
       SELECT 1 FROM pg_snapshot_xip(?::pg_snapshot) AS x
       JOIN pg_stat_activity a ON a.datname = current_database() AND a.backend_xid IS NOT NULL
        AND a.backend_xid::text::bigint = x::text::bigint % 4294967296
       WHERE pg_xact_status(x) = 'in progress'
     ) AS settled`,
    [horizon.snapshot],
  );
  return rows[0]?.settled ?? false;
}

/**
 * The rollup job. Grades are read by id past the mark, but ids are drawn before commit, so a
 * transaction can commit a lower id after a higher one was read; the mark therefore moves only up
 * to a horizon every transaction of which has finished (checked against a snapshot), never past a
 * grade still in flight. One worker at a time does a pass (the mark row is locked, others skip).
 */
export function createRollups({ db }: { db: Knex }) {
  let pending: GradeHorizon | null = null;

  return {
    /** One pass: rollups of every checkpoint graded and every assignment viewed since the marks. */
    async runOnce(): Promise<RollupPass> {
      const horizon = pending ?? (await captureHorizon(db));
      const ready = await settled(db, horizon);
      const pass = await db.transaction(async (trx) => {
        const mark = await lockMark(trx);
        if (!mark) return { skipped: true, checkpoints: 0, assignmentsViewed: 0 };
        let checkpoints = 0;
        const upTo = ready ? Math.max(mark.lastGradeId, horizon.upTo) : mark.lastGradeId;
        if (upTo > mark.lastGradeId) {
          for (const [assignmentId, keys] of await checkpointsGradedBetween(trx, mark.lastGradeId, upTo)) {
            await recomputeCheckpointRollups(trx, assignmentId, keys);
            checkpoints += keys.length;
          }
        }
        const { rows } = await trx.raw<{ rows: { now: Date }[] }>('SELECT now() AS now');
        const viewed = await assignmentsViewedSince(trx, mark.lastViewingAt);
        for (const assignmentId of viewed) {
          const coverage = await coverageOf(trx, assignmentId);
          if (!coverage) continue;
          const seconds = recordingSeconds(coverage.durationMs);
          await saveViewingRollup(trx, assignmentId, coverage.bitsets.length, audience(coverage.bitsets, seconds));
        }
        const lookback = new Date(rows[0]!.now.getTime() - VIEWING_LOOKBACK_MS);
        await saveMark(trx, {
          lastGradeId: upTo,
          lastViewingAt: lookback > mark.lastViewingAt ? lookback : mark.lastViewingAt,
        });
        return { skipped: false, checkpoints, assignmentsViewed: viewed.length };
      });
      pending = ready ? null : horizon;
      return pass;
    },
  };
}

export interface RollupLoop {
  stop(): Promise<void>;
}

/** Runs a pass every `intervalMs` until stopped; a failed pass is logged and the next one tries again. */
export function startRollupLoop({
  db,
  logger,
  intervalMs = ROLLUP_INTERVAL_MS,
}: {
  db: Knex;
  logger: Logger;
  intervalMs?: number;
}): RollupLoop {
  const rollups = createRollups({ db });
  let stopped = false;
  let running: Promise<void> = Promise.resolve();
  let timer: NodeJS.Timeout | null = null;

  const schedule = () => {
    if (stopped) return;
    timer = setTimeout(() => {
      running = rollups
        .runOnce()
        .then(
          () => undefined,
          (error: unknown) => {
            if (!stopped) logger.warn({ err: error }, 'rollup pass failed; the next pass tries again');
          },
        )
        .finally(schedule);
    }, intervalMs);
    timer.unref();
  };
  schedule();
  logger.info({ everyMs: intervalMs }, 'rollups: checkpoint and viewing rollups kept by this worker');

  return {
    async stop() {
      stopped = true;
      if (timer) clearTimeout(timer);
      await running;
    },
  };
}
