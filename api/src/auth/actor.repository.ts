import type { Db } from '../db/knex';
import type { Role } from '@core/roles';
import type { ActorMembership } from './actor';

export interface UserRow {
  id: string;
  email: string;
  name: string;
}

/** Loads a user and all their memberships in one round trip per table. */
export async function findActorData(db: Db, userId: string): Promise<{ user: UserRow; memberships: ActorMembership[] } | undefined> {
  const user = await db<UserRow>('users').select('id', 'email', 'name').where({ id: userId }).first();
  if (!user) return undefined;
  const rows = await db('memberships as m')
    .join('schools as s', 's.id', 'm.school_id')
    .where('m.user_id', userId)
    .orderBy('s.name')
    .select<{ schoolId: string; schoolName: string; timeZone: string; locale: string; roles: Role[]; departmentId: string | null }[]>(
      'm.school_id as schoolId',
      's.name as schoolName',
      's.time_zone as timeZone',
      's.locale',
      'm.roles',
      'm.department_id as departmentId',
    );
  return { user, memberships: rows };
}
