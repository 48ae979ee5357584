import type { Actor } from '../../auth/actor';
import type { UploadRow } from './uploads.repository';

/**
 * An upload belongs to the teacher who started it: nobody else, not even an admin, may sign its
 * parts or finish it (they would be sending bytes into someone else's file). Everyone else gets
 * "not found", so an upload's existence is never revealed.
 */
export function canUseUpload(actor: Actor, upload: UploadRow): boolean {
  return upload.schoolId === actor.active.schoolId && upload.ownerId === actor.userId && actor.active.roles.includes('teacher');
}
