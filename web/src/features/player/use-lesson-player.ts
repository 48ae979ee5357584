import { useCallback, useEffect, useMemo, useRef, useState } from 'react';
import type { CheckpointAnswer, CheckpointGradeDto, StudentLessonView } from '@core/contracts';
import { isApiError } from '@/lib/api-client';
import { clockOf } from './media-clock';
import { nextAttempt, type AttemptBook } from './logic/attempts';
import { PinScheduler } from './logic/pin-scheduler';
import { guardSeek } from './logic/seek-guard';
import {
  initialPlayerState,
  isStopActive,
  isStopDone,
  playerReducer,
  type OverlayReason,
  type PlayerEvent,
  type PlayerState,
} from './logic/player-state';
import { answerlessPinsBefore, buildStops, type Stop } from './logic/stops';
import type { Player } from './video-player';

/** What the player reports to its page (the watch page records some of it). */
export type LessonPlayerEvent =
  | { type: 'safety-acknowledged' }
  | { type: 'stopped'; key: string; phase: Stop['phase']; reason: OverlayReason; atMs: number }
  | { type: 'graded'; key: string; attempt: number; grade: CheckpointGradeDto; feedbackHidden: boolean }
  | { type: 'queued'; key: string; attempt: number }
  | { type: 'skipped'; key: string }
  | { type: 'continued'; key: string; phase: Stop['phase'] }
  | { type: 'aside-dismissed'; key: string };

/** What became of one answer: graded now, or kept on this device to be sent when the connection returns. */
export type AnswerOutcome = { status: 'graded'; grade: CheckpointGradeDto; feedbackHidden: boolean } | { status: 'queued' };

/**
 * Sends one answer and resolves with its outcome; rejects when it was neither graded nor kept (the
 * panel says so and the student may send it again). `attempt` is the player's own count.
 */
export type AnswerSender = (key: string, answer: CheckpointAnswer, attempt: number) => Promise<AnswerOutcome>;

/** The grade of a queued answer, arrived later; `id` is unique per answer and each one is applied once. */
export type GradeArrival = {
  id: string;
  key: string;
  attempt: number;
  answer: CheckpointAnswer;
  grade: CheckpointGradeDto;
  feedbackHidden: boolean;
};

/** A queued answer the server refused for good (closed, no attempts left…): not recorded; `message` says why. */
export type AnswerRefusal = { id: string; key: string; attempt: number; message: string };

type Options = {
  view: StudentLessonView;
  onAnswer: AnswerSender;
  onEvent?: (event: LessonPlayerEvent) => void;
  safetyAcknowledged?: boolean;
  initialBook?: AttemptBook;
  arrivals?: readonly GradeArrival[];
  refusals?: readonly AnswerRefusal[];
};

function sendErrorText(error: unknown): string {
  if (isApiError(error) && error.status !== 0) return error.message;
  return 'The connection failed before the answer was graded. Check the connection and send it again; no attempt was used.';
}

/** The player's state (kept in a ref as well, so the scheduler's callbacks never read a stale copy) and its scheduler. */
export function useLessonPlayer({ view, onAnswer, onEvent, safetyAcknowledged = false, initialBook, arrivals, refusals }: Options) {
  const needsSafety = view.safetyNotes.trim() !== '' && !safetyAcknowledged;
  const [state, setState] = useState<PlayerState>(() => ({ ...initialPlayerState(needsSafety), book: initialBook ?? {} }));
  const stateRef = useRef(state);
  const eventRef = useRef(onEvent);
  useEffect(() => {
    eventRef.current = onEvent;
  });
  const [player, setPlayer] = useState<Player | null>(null);
  const [scheduler, setScheduler] = useState<PinScheduler | null>(null);
  const [busy, setBusy] = useState(false);
  const [sendError, setSendError] = useState<{ key: string; message: string } | null>(null);
  const stops = useMemo(() => buildStops(view), [view]);

  const dispatch = useCallback((event: PlayerEvent) => {
    const next = playerReducer(stateRef.current, event);
    stateRef.current = next;
    setState(next);
    return next;
  }, []);
  const report = useCallback((event: LessonPlayerEvent) => eventRef.current?.(event), []);

  const onStop = useCallback(
    (stop: Stop, reason: OverlayReason) => {
      setSendError(null);
      dispatch({ type: 'reach', stop, reason });
      report({ type: 'stopped', key: stop.key, phase: stop.phase, reason, atMs: stop.atMs });
      // A full-screen video would hide the panel: come back to the page to answer.
      if (stop.pauses && player?.isFullscreen()) void Promise.resolve(player.exitFullscreen()).catch(() => undefined);
    },
    [dispatch, report, player],
  );

  useEffect(() => {
    if (!player || player.isDisposed()) return;
    const created = new PinScheduler(clockOf(player), stops, {
      isActive: (stop) => isStopActive(stateRef.current, stop),
      isDone: (stop) => isStopDone(stateRef.current, stop),
      isHolding: () => !stateRef.current.started || stateRef.current.overlay !== null,
      onStop,
    });
    setScheduler(created);
    return () => {
      created.dispose();
      setScheduler(null);
    };
  }, [player, stops, onStop]);

  // Any change (an overlay closed, an answer graded) may change the next stop.
  useEffect(() => {
    scheduler?.arm();
  }, [scheduler, state]);

  const resume = useCallback(() => {
    if (!player || player.isDisposed()) return;
    const element = player.el();
    if (element instanceof HTMLElement) element.focus();
    void Promise.resolve(player.play()).catch(() => undefined);
  }, [player]);

  const submit = useCallback(
    async (key: string, answer: CheckpointAnswer) => {
      const attempt = nextAttempt(stateRef.current.book, key);
      setBusy(true);
      setSendError(null);
      try {
        const outcome = await onAnswer(key, answer, attempt);
        if (outcome.status === 'queued') {
          dispatch({ type: 'queued', key, attempt, answer });
          report({ type: 'queued', key, attempt });
        } else {
          const { grade, feedbackHidden } = outcome;
          dispatch({ type: 'graded', key, attempt, answer, grade, feedbackHidden });
          report({ type: 'graded', key, attempt, grade, feedbackHidden });
        }
      } catch (error) {
        setSendError({ key, message: sendErrorText(error) });
      } finally {
        setBusy(false);
      }
    },
    [onAnswer, dispatch, report],
  );

  // Grades of queued answers, and refusals, arrive from the page; each is applied once.
  const applied = useRef(new Set<string>());
  useEffect(() => {
    for (const arrival of arrivals ?? []) {
      if (applied.current.has(arrival.id)) continue;
      applied.current.add(arrival.id);
      const { key, attempt, answer, grade, feedbackHidden } = arrival;
      dispatch({ type: 'graded', key, attempt, answer, grade, feedbackHidden });
      report({ type: 'graded', key, attempt, grade, feedbackHidden });
    }
  }, [arrivals, dispatch, report]);
  useEffect(() => {
    for (const refusal of refusals ?? []) {
      if (applied.current.has(refusal.id)) continue;
      applied.current.add(refusal.id);
      dispatch({ type: 'refused', key: refusal.key, attempt: refusal.attempt });
      setSendError({ key: refusal.key, message: refusal.message });
    }
  }, [refusals, dispatch]);

  /** Jump to a checkpoint from the list: open it there (a gate before it still holds the video back). */
  const openCheckpoint = useCallback(
    (stop: Stop) => {
      if (!player || !scheduler || !stateRef.current.started) return;
      const from = (player.currentTime() ?? 0) * 1000;
      const verdict = guardSeek(stops, from, stop.atMs, (s) => isStopDone(stateRef.current, s));
      player.pause();
      scheduler.seekTo(stop.atMs);
      if (verdict.action === 'allow' && stop.pauses) onStop(stop, 'opened');
    },
    [player, scheduler, stops, onStop],
  );

  /**
   * Go on where the student stopped last time. The notes and equation cards before that point were
   * seen then (nothing is recorded for them), so they do not come back; answerable checkpoints
   * follow the stored answers: an unanswered gate still holds, a skipped pause question is shown once.
   */
  const resumeAt = useCallback(
    (ms: number) => {
      if (!player || player.isDisposed() || !stateRef.current.started) return;
      dispatch({ type: 'seen', ids: answerlessPinsBefore(view, stops, ms) });
      player.currentTime(ms / 1000);
      void Promise.resolve(player.play()).catch(() => undefined);
    },
    [player, view, stops, dispatch],
  );

  return {
    state,
    stops,
    resumeAt,
    player,
    setPlayer,
    scheduler,
    busy,
    sendError,
    submit,
    openCheckpoint,
    acknowledgeSafety: () => {
      dispatch({ type: 'start' });
      report({ type: 'safety-acknowledged' });
    },
    skip: () => {
      const key = stateRef.current.overlay?.stop.key;
      const next = dispatch({ type: 'skip' });
      if (key && !next.overlay) {
        report({ type: 'skipped', key });
        resume();
      }
    },
    proceed: (answerable: boolean) => {
      const stop = stateRef.current.overlay?.stop;
      const next = dispatch({ type: 'continue', answerable });
      if (stop && !next.overlay) {
        setSendError(null);
        report({ type: 'continued', key: stop.key, phase: stop.phase });
        resume();
      }
    },
    tryAgain: () => dispatch({ type: 'try-again' }),
    dismissAside: (key: string) => {
      dispatch({ type: 'dismiss-aside', key });
      report({ type: 'aside-dismissed', key });
    },
  };
}
