import type { WatchViewDto } from '@core/contracts';
import { recordQueued, type AttemptBook, type AttemptRecord } from '@/features/player/logic/attempts';
import type { OutboxEntry } from '../outbox/outbox-entry';

/** Right/wrong is hidden while the student watches unless feedback is immediate (after-due applies only after the close). */
export function feedbackHiddenWhileWatching(view: WatchViewDto): boolean {
  return view.assignment.feedback !== 'immediately';
}

/**
 * The player's starting book: what the server recorded (grades already cut down by the policies),
 * plus the answers still waiting on this device, so a gate answered offline stays open after a reload.
 */
export function watchBook(view: WatchViewDto, waiting: readonly OutboxEntry[]): AttemptBook {
  const hidden = feedbackHiddenWhileWatching(view);
  let book: AttemptBook = Object.fromEntries(
    Object.entries(view.book).map(([key, record]): [string, AttemptRecord] => [key, { ...record, feedbackHidden: hidden }]),
  );
  for (const entry of waiting) book = recordQueued(book, entry.body.checkpointKey, entry.attempt, entry.body.answer);
  return book;
}
