import { useEffect, useSyncExternalStore } from 'react';
import type { Role } from '@core/roles';
import type { SessionToken } from '../api/session-token';
import type { AnswerOutbox, OutboxStatus } from './answer-outbox';
import { studentChannel } from './outbox-registry';

export type OutboxPerson = { userId: string; role: Role; csrfToken: string };

/**
 * This student's answer queue and its status, kept moving: it loads what earlier pages left, and
 * tries again when the connection returns or the page is shown again. It sends only while the
 * person acts as a student (the server takes answers from that role only); for other roles it just
 * counts what waits on this device.
 */
export function useAnswerOutbox(person: OutboxPerson): { outbox: AnswerOutbox; session: SessionToken; status: OutboxStatus } {
  const { outbox, session } = studentChannel(person.userId, person.csrfToken);
  const sending = person.role === 'student';
  useEffect(() => {
    if (!sending) {
      void outbox.load();
      return;
    }
    outbox.start();
    const again = () => void outbox.refresh();
    const visible = () => {
      if (document.visibilityState === 'visible') again();
    };
    window.addEventListener('online', again);
    document.addEventListener('visibilitychange', visible);
    return () => {
      window.removeEventListener('online', again);
      document.removeEventListener('visibilitychange', visible);
    };
  }, [outbox, sending]);
  const status = useSyncExternalStore(
    (listener) => outbox.subscribe(listener),
    () => outbox.status(),
  );
  return { outbox, session, status };
}
