import type { Actor } from '../../auth/actor';
import type { RecordingState } from '@core/contracts';

/** The stored facts access depends on (always the loaded row, never ids from the request). */
export interface RecordingAccessFacts {
  schoolId: string;
  ownerId: string | null;
  state: RecordingState;
}

/**
 * Who may see and play a recording: teachers and admins of its school. An upload still in progress
 * is its owner's alone until it completes. Students' access through assigned lessons is added here.
 */
export function canViewRecording(actor: Actor, row: RecordingAccessFacts): boolean {
  const { schoolId, roles } = actor.active;
  if (row.schoolId !== schoolId) return false;
  if (!roles.includes('teacher') && !roles.includes('admin')) return false;
  return row.state !== 'uploading' || row.ownerId === actor.userId;
}

/** Who may rename, delete, retry or caption it: the teacher who uploaded it, or an admin of the school. */
export function canEditRecording(actor: Actor, row: RecordingAccessFacts): boolean {
  if (!canViewRecording(actor, row)) return false;
  const { roles } = actor.active;
  return roles.includes('admin') || (roles.includes('teacher') && row.ownerId !== null && row.ownerId === actor.userId);
}
