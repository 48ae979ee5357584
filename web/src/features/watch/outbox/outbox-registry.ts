import { SessionToken } from '../api/session-token';
import { submitResponse } from '../api/submit-response';
import { AnswerOutbox } from './answer-outbox';
import { indexedDbOutboxStore, type OutboxStore } from './outbox-store';

type Student = { outbox: AnswerOutbox; session: SessionToken };

let store: OutboxStore | null = null;
const students = new Map<string, Student>();

/**
 * The one answer queue and session token of a student in this tab (the watch page, its viewing
 * reports and the header's sign-out control share them), created on first use.
 */
export function studentChannel(userId: string, csrfToken: string): Student {
  const known = students.get(userId);
  if (known) {
    // Signed in again (a new session): its token from now on.
    known.session.adopt(csrfToken);
    return known;
  }
  store ??= indexedDbOutboxStore();
  const session = new SessionToken(userId, csrfToken);
  const outbox = new AnswerOutbox(userId, {
    store,
    session,
    send: (entry, token) => submitResponse(entry.assignmentId, entry.body, token),
  });
  const created = { outbox, session };
  students.set(userId, created);
  return created;
}

/** Stops every queue of this tab (after sign-out); what they hold stays on the device for the next sign-in. */
export function closeOutboxes(): void {
  for (const { outbox } of students.values()) outbox.dispose();
  students.clear();
  store = null;
}
