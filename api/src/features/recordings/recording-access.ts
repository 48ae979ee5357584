import type { Db } from '../../db/knex';
import type { Actor } from '../../auth/actor';
import { ForbiddenError, NotFoundError } from '../../errors';
import { findRecordingView, type RecordingView } from './recordings.read-model';
import { canEditRecording, canViewRecording } from './recordings.policy';

/**
 * A recording of the caller's school that the caller may see. Anything else, another school's
 * included, is the same 404: ids of other schools reveal nothing.
 */
export async function loadViewable(db: Db, actor: Actor, recordingId: string): Promise<RecordingView> {
  const row = await findRecordingView(db, actor.active.schoolId, recordingId);
  if (!row || !canViewRecording(actor, row)) throw new NotFoundError('That recording');
  return row;
}

/** A recording the caller may change: its owner, or an admin of the school. */
export async function loadEditable(db: Db, actor: Actor, recordingId: string): Promise<RecordingView> {
  const row = await loadViewable(db, actor, recordingId);
  if (!canEditRecording(actor, row)) {
    throw new ForbiddenError('Only the teacher who uploaded this recording, or an admin of the school, can change it.');
  }
  return row;
}
