import type { ApiError } from '@/lib/api-client';
import type { SessionCheck } from '../api/session-token';
import type { OutboxEntry } from './outbox-entry';

/**
 * What a failed send means for a queued answer:
 * - retry: no connection, a timeout, too many requests or a server fault; the same request may work later;
 * - session: 401/403/404 may come from the session (signed out, another person or role, another
 *   school chosen in another tab), not from the answer: ask who is signed in before deciding;
 * - refused: the server read the answer and will never take it (closed, no attempts left, unknown
 *   checkpoint, another answer with the same key): drop it and say why.
 */
export type SendFailure = 'retry' | 'session' | 'refused';

export function sendFailure(error: ApiError): SendFailure {
  const { status } = error;
  if (status === 0 || status === 408 || status === 429 || status >= 500) return 'retry';
  if (status === 401 || status === 403 || status === 404) return 'session';
  return 'refused';
}

/** Why sending stopped until the right student's session is back. */
export type HoldReason = 'signed-out' | 'other-user' | 'other-role' | 'other-school';

/** Whether the session signed in now may send this entry: null if so, else why not. */
export function holdReasonOf(check: Extract<SessionCheck, { kind: 'signed-in' | 'signed-out' }>, entry: OutboxEntry): HoldReason | null {
  if (check.kind === 'signed-out') return 'signed-out';
  if (check.userId !== entry.userId) return 'other-user';
  if (check.role !== 'student') return 'other-role';
  if (check.schoolId !== entry.schoolId) return 'other-school';
  return null;
}
