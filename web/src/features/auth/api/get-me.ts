import { queryOptions, useQuery } from '@tanstack/react-query';
import { MeDtoSchema, type MeDto } from '@core/contracts';
import { api, isApiError, setCsrfToken } from '@/lib/api-client';
import { authKeys } from './keys';

/** The signed-in person, or null when nobody is signed in (a 401 is an answer here, not a failure). */
export async function getMe(): Promise<MeDto | null> {
  try {
    const me = await api.get('/api/me', MeDtoSchema);
    setCsrfToken(me.csrfToken);
    return me;
  } catch (error) {
    if (isApiError(error) && error.status === 401) {
      setCsrfToken(null);
      return null;
    }
    throw error;
  }
}

export const meQueryOptions = () => queryOptions({ queryKey: authKeys.me(), queryFn: getMe, staleTime: 60_000 });

export const useMe = () => useQuery(meQueryOptions());

/** The membership of the school the person is acting in. */
export function activeMembership(me: MeDto) {
  return me.memberships.find((membership) => membership.schoolId === me.active.schoolId);
}
