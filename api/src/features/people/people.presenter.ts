import type { PersonDto } from '@core/contracts';
import type { Actor } from '../../auth/actor';
import type { PersonRow } from './people.read-model';

/** A person as an admin sees them, with what the caller may do to them. */
export function presentPerson(row: PersonRow, actor: Actor): PersonDto {
  return {
    userId: row.userId,
    email: row.email,
    name: row.name,
    roles: row.roles,
    status: row.status,
    departmentId: row.departmentId,
    departmentName: row.departmentName,
    classNames: row.classNames,
    lastSignInAt: row.lastSignInAt ? new Date(row.lastSignInAt).toISOString() : null,
    abilities: { changeRoles: actor.active.roles.includes('admin') },
  };
}
