import { MeDtoSchema } from '@core/contracts';
import type { Role } from '@core/roles';
import { api, isApiError } from '@/lib/api-client';

/** Who is signed in on this browser right now, as the server says. */
export type SessionCheck =
  { kind: 'signed-in'; userId: string; role: Role; schoolId: string; token: string } | { kind: 'signed-out' } | { kind: 'unreachable' };

async function askServer(): Promise<SessionCheck> {
  try {
    const me = await api.get('/api/me', MeDtoSchema);
    return { kind: 'signed-in', userId: me.user.id, role: me.active.role, schoolId: me.active.schoolId, token: me.csrfToken };
  } catch (error) {
    if (isApiError(error) && error.status === 401) return { kind: 'signed-out' };
    return { kind: 'unreachable' };
  }
}

/**
 * The CSRF token of one signed-in student's session. A token the server refuses means the session
 * changed (signed out, or someone else signed in from another tab): `check()` asks who is signed in
 * now, and only the same student's fresh token is taken.
 */
export class SessionToken {
  constructor(
    readonly userId: string,
    private token: string | null,
    private readonly ask: () => Promise<SessionCheck> = askServer,
  ) {}

  current(): string | null {
    return this.token;
  }

  /** The page learnt a newer token for the same person (MeDto.csrfToken). */
  adopt(token: string): void {
    this.token = token;
  }

  async check(): Promise<SessionCheck> {
    const result = await this.ask();
    if (result.kind === 'signed-in' && result.userId === this.userId) this.token = result.token;
    return result;
  }
}
