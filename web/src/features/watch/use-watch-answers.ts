import { useCallback, useEffect, useMemo, useState, useSyncExternalStore } from 'react';
import type { CompletionDto, WatchViewDto } from '@core/contracts';
import type { AnswerRefusal, AnswerSender, GradeArrival } from '@/features/player/use-lesson-player';
import { newIdempotencyKey } from './logic/idempotency-key';
import { watchBook } from './logic/watch-book';
import type { AnswerOutbox } from './outbox/answer-outbox';
import type { OutboxEntry } from './outbox/outbox-entry';
import { serverClock } from './server-clock';

export type RefusedAnswer = { id: string; checkpointKey: string; message: string };

/** A completion as of a reply's server time: the newest one wins. */
type Reported = { completion: CompletionDto; at: string };

const newer = (a: Reported | null, b: Reported | null): Reported | null => {
  if (!a || !b) return a ?? b;
  return Date.parse(b.at) >= Date.parse(a.at) ? b : a;
};

type Options = {
  assignmentId: string;
  userId: string;
  schoolId: string;
  view: WatchViewDto | undefined;
  outbox: AnswerOutbox;
};

/**
 * The watch page's side of answering: each answer goes through the durable queue (kept on the
 * device first, with its time on the server's clock); replies to queued answers, also those that
 * came before the page opened, become arrivals and refusals for the player; the completion follows
 * the newest reply.
 */
export function useWatchAnswers({ assignmentId, userId, schoolId, view, outbox }: Options) {
  const [waitingAtStart, setWaitingAtStart] = useState<readonly OutboxEntry[] | null>(null);
  const [dismissed, setDismissed] = useState<ReadonlySet<string>>(() => new Set());
  const [replied, setReplied] = useState<Reported | null>(null);
  const [gaveHere, setGaveHere] = useState(false);

  useEffect(() => {
    let live = true;
    void outbox.load().then(() => {
      if (live) setWaitingAtStart(outbox.pendingFor(assignmentId));
    });
    return () => {
      live = false;
    };
  }, [outbox, assignmentId]);

  // The player reads this once, when it mounts: the server's book plus what waited on the device.
  const initialBook = useMemo(() => (view && waitingAtStart ? watchBook(view, waitingAtStart) : null), [view, waitingAtStart]);

  const log = useSyncExternalStore(
    (listener) => outbox.subscribe(listener),
    () => outbox.events(),
  );
  const mine = useMemo(() => log.filter((event) => event.entry.assignmentId === assignmentId), [log, assignmentId]);
  const arrivals = useMemo<GradeArrival[]>(
    () =>
      mine.flatMap((event) =>
        event.type === 'recorded'
          ? [
              {
                id: event.entry.idempotencyKey,
                key: event.entry.body.checkpointKey,
                attempt: event.entry.attempt,
                answer: event.entry.body.answer,
                grade: event.result.grade,
                feedbackHidden: event.result.feedbackHidden,
              },
            ]
          : [],
      ),
    [mine],
  );
  const refusals = useMemo<AnswerRefusal[]>(
    () =>
      mine.flatMap((event) =>
        event.type === 'refused'
          ? [{ id: event.entry.idempotencyKey, key: event.entry.body.checkpointKey, attempt: event.entry.attempt, message: event.message }]
          : [],
      ),
    [mine],
  );
  // Refused, or graded as unreadable (an unknown unit typed offline): either way nothing was recorded.
  const refused: RefusedAnswer[] = mine
    .flatMap((event): RefusedAnswer[] => {
      const id = event.entry.idempotencyKey;
      const checkpointKey = event.entry.body.checkpointKey;
      if (event.type === 'refused') return [{ id, checkpointKey, message: event.message }];
      return event.result.grade.invalid ? [{ id, checkpointKey, message: event.result.grade.feedback }] : [];
    })
    .filter((item) => !dismissed.has(item.id));
  const lastRecorded = mine.findLast((event) => event.type === 'recorded');
  const fromQueue =
    lastRecorded?.type === 'recorded' ? { completion: lastRecorded.result.completion, at: lastRecorded.result.serverTime } : null;

  const onAnswer: AnswerSender = useCallback(
    async (key, answer, attempt) => {
      setGaveHere(true);
      const idempotencyKey = newIdempotencyKey();
      const entry: OutboxEntry = {
        idempotencyKey,
        userId,
        schoolId,
        assignmentId,
        attempt,
        queuedAt: Date.now(),
        body: { idempotencyKey, checkpointKey: key, answer, answeredAt: serverClock.now().toISOString() },
      };
      const outcome = await outbox.submit(entry);
      if (outcome.status === 'queued') return { status: 'queued' };
      const { result } = outcome;
      setReplied((before) => newer(before, { completion: result.completion, at: result.serverTime }));
      return { status: 'graded', grade: result.grade, feedbackHidden: result.feedbackHidden };
    },
    [outbox, userId, schoolId, assignmentId],
  );

  const reportCompletion = useCallback((completion: CompletionDto, at: string) => {
    setReplied((before) => newer(before, { completion, at }));
  }, []);

  const anyGiven =
    gaveHere || (waitingAtStart?.length ?? 0) > 0 || mine.length > 0 || Object.values(view?.book ?? {}).some((record) => record.used > 0);

  return {
    /** Null until the view and the device's queue are both read. */
    initialBook,
    /** The student gave at least one answer here: recorded before, waiting on this device, or given on this page. */
    anyGiven,
    onAnswer,
    arrivals,
    refusals,
    refused,
    dismissRefused: (id: string) => setDismissed((set) => new Set([...set, id])),
    /** The newest completion a reply reported (null: none yet, use the view's). */
    completion: newer(replied, fromQueue)?.completion ?? null,
    /** A viewing report's reply. */
    reportCompletion,
  };
}
