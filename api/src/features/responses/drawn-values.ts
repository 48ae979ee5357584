import type { Knex } from 'knex';
import type { CheckpointOf } from '@core/contracts';
import { drawnValuesFor } from '@core/lessons';
import type { VariableValues } from '@core/physics/units/types';
import type { AssignmentContext } from './assignment-context';

type NumericCheckpoint = CheckpointOf<'numeric'>;
type Drawn = Record<string, VariableValues>;

/** The seed of one student's numbers in one assignment (the view and grading use it). */
export const studentSeed = (assignmentId: string, studentId: string) => `${assignmentId}:${studentId}`;

// Stored values are never replaced (only missing names are added), so what was read once stays true.
const KEPT = 20_000;
const known = new Map<string, Drawn>();

// Per lesson version's content (contexts keep one object per version): found once, not on every answer.
const numericByContent = new WeakMap<AssignmentContext['content'], NumericCheckpoint[]>();

function numericWithVariables(ctx: AssignmentContext): NumericCheckpoint[] {
  let found = numericByContent.get(ctx.content);
  if (!found) {
    found = ctx.content.checkpoints.filter((c): c is NumericCheckpoint => c.kind === 'numeric' && c.variables.length > 0);
    numericByContent.set(ctx.content, found);
  }
  return found;
}

/** Every variable of the checkpoint has a stored value (a corrected version may have added one). */
const complete = (checkpoint: NumericCheckpoint, values: VariableValues | undefined) =>
  values !== undefined && checkpoint.variables.every((v) => v.name in values);

async function readStored(db: Knex | Knex.Transaction, assignmentId: string, studentId: string): Promise<Drawn> {
  const rows = await db('student_variables')
    .where({ assignment_id: assignmentId, student_id: studentId })
    .select<{ checkpoint_key: string; values: VariableValues }[]>('checkpoint_key', 'values');
  return Object.fromEntries(rows.map((r) => [r.checkpoint_key, r.values]));
}

/**
 * This student's values for every numeric checkpoint of the assignment, drawn on first use with
 * `drawnValuesFor(checkpoint, "<assignmentId>:<studentId>")` and stored (ON CONFLICT DO NOTHING, then
 * read back, so two racing first views agree). A variable a corrected version added is drawn and
 * added beside the stored ones; stored values are never changed.
 */
export async function ensureDrawnValues(db: Knex | Knex.Transaction, ctx: AssignmentContext, studentId: string): Promise<Drawn> {
  const numeric = numericWithVariables(ctx);
  const cacheKey = studentSeed(ctx.id, studentId);
  const cached = known.get(cacheKey);
  if (cached && numeric.every((c) => complete(c, cached[c.key]))) return cached;
  if (numeric.length === 0) return {};

  let stored = await readStored(db, ctx.id, studentId);
  const missing = numeric.filter((c) => !complete(c, stored[c.key]));
  if (missing.length > 0) {
    const seed = studentSeed(ctx.id, studentId);
    const fresh = missing.filter((c) => stored[c.key] === undefined);
    const partial = missing.filter((c) => stored[c.key] !== undefined);
    if (fresh.length > 0) {
      await db('student_variables')
        .insert(
          fresh.map((c) => ({ assignment_id: ctx.id, student_id: studentId, checkpoint_key: c.key, values: drawnValuesFor(c, seed) })),
        )
        .onConflict(['assignment_id', 'student_id', 'checkpoint_key'])
        .ignore();
    }
    for (const checkpoint of partial) {
      // jsonb `||` keeps the left side's keys out of the way: stored names win over the new draw.
      await db('student_variables')
        .where({ assignment_id: ctx.id, student_id: studentId, checkpoint_key: checkpoint.key })
        .update({ values: db.raw('?::jsonb || "values"', [JSON.stringify(drawnValuesFor(checkpoint, seed))]) });
    }
    stored = await readStored(db, ctx.id, studentId);
  }
  // Inside a transaction the rows may still roll back: remember only what is committed.
  if (!db.isTransaction) {
    if (known.size >= KEPT) known.delete(known.keys().next().value as string);
    known.set(cacheKey, stored);
  }
  return stored;
}
