import { activeMembership } from '@/features/auth/api/get-me';
import { useSignedInMe } from '@/features/auth/components/me-context';
import type { SchoolClock } from '@/lib/format';

/** The active school's time zone and locale, for showing dates as the school reads them. */
export function useSchoolClock(): SchoolClock {
  const membership = activeMembership(useSignedInMe());
  return { timeZone: membership?.timeZone ?? 'UTC', locale: membership?.locale ?? 'en-GB' };
}
