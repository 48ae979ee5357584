import type { Knex } from 'knex';
import type pg from 'pg';
import { isAnswered, type ResponseResultDto, type ResponseSubmit } from '@core/contracts';
import type { Actor } from '../../auth/actor';
import { AppError } from '../../errors';
import type { AssignmentContexts } from './assignment-context';
import { ensureDrawnValues } from './drawn-values';
import { createGroupCommit, type Settled } from './group-commit';
import { requestHash } from './request-hash';
import {
  assignmentVersionsSql,
  insertResponsesSql,
  lockProgressSql,
  pairKey,
  submitStateSql,
  toSubmitState,
  type LockedProgress,
  type PairKey,
  type StateRow,
} from './responses.repository';
import { planBatch, type Submission, type SubmitOutcome } from './submission-plan';
import type { SubmitRateLimit } from './submit-rate-limit';

export interface ResponsesServiceDeps {
  db: Knex;
  /** The group commit runs on a plain pg connection: several statements per round trip. */
  pool: pg.Pool;
  contexts: AssignmentContexts;
  rateLimit: SubmitRateLimit;
  /** Transactions in flight at once (each a group of answers); default 2 (measured best: bigger groups, fewer round trips). */
  lanes?: number;
  /** Answers in one transaction at most; default 64. */
  maxBatch?: number;
}

/** The answer was planned with an assignment version that a move replaced meanwhile: plan it again. */
class StaleAssignmentError extends Error {
  constructor(readonly assignmentId: string) {
    super('The assignment moved to another version while the answer waited.');
  }
}

// Deadlocks and serialization failures are retried whole: the batch is decided again from fresh state.
const RETRYABLE = new Set(['40P01', '40001']);
const RETRIES = 3;

/**
 * One transaction for a batch, in two round trips: BEGIN, lock the progress rows, read the state
 * (a statement of its own, so it sees whatever the previous lock holder committed); then the
 * inserts and COMMIT. The results are handed back only once COMMIT has returned.
 */
async function writeOnce(pool: pg.Pool, items: Submission[]): Promise<Settled<SubmitOutcome>[]> {
  const pairs = new Map<string, PairKey>();
  for (const { ctx, studentId } of items) {
    pairs.set(pairKey(ctx.id, studentId), { assignmentId: ctx.id, studentId, schoolId: ctx.schoolId, classId: ctx.classId });
  }
  const client = await pool.connect();
  let broken: unknown;
  try {
    const opened = (await client.query(
      `BEGIN; ${lockProgressSql([...pairs.values()])}; ${assignmentVersionsSql(items.map((i) => i.ctx.id))}; ${submitStateSql(
        items.map((i) => ({
          assignmentId: i.ctx.id,
          studentId: i.studentId,
          checkpointKey: i.checkpoint.key,
          idempotencyKey: i.input.idempotencyKey,
        })),
      )}`,
    )) as unknown as [
      pg.QueryResult,
      pg.QueryResult<LockedProgress>,
      pg.QueryResult<{ id: string; versionNumber: number }>,
      pg.QueryResult<StateRow>,
    ];
    const locked = new Map(opened[1].rows.map((row) => [pairKey(row.assignmentId, row.studentId), row]));
    const versions = new Map(opened[2].rows.map((row) => [row.id, row.versionNumber]));
    const states = opened[3].rows.map(toSubmitState);
    const current = items.map((item) => versions.get(item.ctx.id) === item.ctx.versionNumber);
    const plan = planBatch(
      items.filter((_, index) => current[index]),
      locked,
      states.filter((_, index) => current[index]),
      new Date(),
    );
    const insert = insertResponsesSql(plan.inserts, plan.completed);
    await client.query(insert ? `${insert}; COMMIT` : 'COMMIT');
    const planned = plan.results[Symbol.iterator]();
    return items.map((item, index): Settled<SubmitOutcome> =>
      current[index] ? planned.next().value! : { ok: false, error: new StaleAssignmentError(item.ctx.id) },
    );
  } catch (error) {
    await client.query('ROLLBACK').catch((rollbackError: unknown) => {
      broken = rollbackError;
    });
    throw error;
  } finally {
    // A connection that cannot even roll back is not handed to the next batch.
    client.release(broken instanceof Error ? broken : undefined);
  }
}

async function writeBatch(pool: pg.Pool, items: Submission[]): Promise<Settled<SubmitOutcome>[]> {
  for (let attempt = 1; ; attempt += 1) {
    try {
      return await writeOnce(pool, items);
    } catch (error) {
      const code = (error as { code?: string }).code;
      if (attempt >= RETRIES || !code || !RETRYABLE.has(code)) throw error;
    }
  }
}

/**
 * Students' answers, recorded exactly once. Each answer is graded by the engine with the student's
 * stored values and written with its grade under the lock of the student's progress row (which
 * numbers the attempts); the reply leaves only after the transaction has committed. Answers that
 * arrive together share one transaction (group commit, see group-commit.ts).
 */
export function createResponsesService(deps: ResponsesServiceDeps) {
  const { db, pool, contexts, rateLimit } = deps;
  const writer = createGroupCommit<Submission, SubmitOutcome>({
    // One connection of the pool stays free for the session store.
    lanes: deps.lanes ?? Math.max(1, Math.min(2, (pool.options.max ?? 10) - 1)),
    maxBatch: deps.maxBatch ?? 64,
    laneKey: (item) => item.studentId,
    run: (items) => writeBatch(pool, items),
  });

  return {
    /** Grades and records one answer; a resend of its key gets the stored result (status 200). */
    async submit(actor: Actor, assignmentId: string, input: ResponseSubmit): Promise<{ status: 200 | 201; result: ResponseResultDto }> {
      await rateLimit.take(actor.userId);
      const receivedAt = new Date();
      for (let planned = 1; ; planned += 1) {
        try {
          return await record(actor, assignmentId, input, receivedAt);
        } catch (error) {
          if (!(error instanceof StaleAssignmentError) || planned >= RETRIES) throw error;
          contexts.forget(error.assignmentId);
        }
      }
    },
  };

  async function record(
    actor: Actor,
    assignmentId: string,
    input: ResponseSubmit,
    receivedAt: Date,
  ): Promise<{ status: 200 | 201; result: ResponseResultDto }> {
    const ctx = await contexts.forStudent(actor, assignmentId);
    const checkpoint = ctx.content.checkpoints.find((candidate) => candidate.key === input.checkpointKey);
    if (!checkpoint || !isAnswered(checkpoint)) {
      throw new AppError(
        404,
        'unknown_checkpoint',
        checkpoint
          ? 'That checkpoint takes no answer.'
          : `There is no checkpoint “${input.checkpointKey}” in version ${ctx.versionNumber} of this lesson. Reload the page to get the lesson as assigned.`,
      );
    }
    const drawn = await ensureDrawnValues(db, ctx, actor.userId);
    const outcome = await writer.submit({
      ctx,
      studentId: actor.userId,
      checkpoint,
      input,
      requestHash: requestHash(assignmentId, input),
      receivedAt,
      values: drawn[checkpoint.key],
    });
    return { status: outcome.status, result: { ...outcome.result, serverTime: new Date().toISOString() } };
  }
}

export type ResponsesService = ReturnType<typeof createResponsesService>;
