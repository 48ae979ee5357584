import type { MeDto } from '@core/contracts';
import type { Actor } from '../../auth/actor';

/** What the web app learns about the signed-in person: their schools and roles, never other people's data. */
export function presentMe(actor: Actor, csrfToken: string): MeDto {
  return {
    user: { id: actor.userId, email: actor.email, name: actor.name },
    memberships: actor.memberships.map((m) => ({
      schoolId: m.schoolId,
      schoolName: m.schoolName,
      timeZone: m.timeZone,
      locale: m.locale,
      roles: m.roles,
    })),
    active: { schoolId: actor.active.schoolId, role: actor.active.role },
    csrfToken,
  };
}
