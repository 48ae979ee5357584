import { useEffect, useImperativeHandle, useRef, type Ref } from 'react';
import { CHECKPOINT_KIND_LABELS, type PlaybackDto, type StudentLessonView } from '@core/contracts';
import { formatTime } from '@core/lessons/time-format';
import { cn } from '@/lib/cn';
import { AsideCard } from './components/aside-card';
import { ChapterList } from './components/chapter-list';
import { CheckpointList } from './components/checkpoint-list';
import { CheckpointOverlay } from './components/checkpoint-overlay';
import { CheckpointTicks } from './components/checkpoint-ticks';
import { SafetyNotice } from './components/safety-notice';
import { recordOf, type AttemptBook } from './logic/attempts';
import { isStopDone } from './logic/player-state';
import { checkpointAt } from './logic/stops';
import { useCurrentMs } from './use-current-ms';
import { KeyboardHelp } from './components/keyboard-help';
import {
  useLessonPlayer,
  type AnswerOutcome,
  type AnswerRefusal,
  type AnswerSender,
  type GradeArrival,
  type LessonPlayerEvent,
} from './use-lesson-player';
import { PlayerLocaleContext } from './player-locale';
import { VideoPlayer, type Player } from './video-player';

export type { AnswerOutcome, AnswerRefusal, AnswerSender, GradeArrival, LessonPlayerEvent };

/** What a page may ask of the player beyond its props. */
export type LessonPlayerControls = {
  /** Go on from where the student stopped last time (the notes and equation cards before it count as seen). */
  resumeAt(ms: number): void;
};

/** Marks the video element while the safety notes hold it, so its big play button hides (see player.css). */
const LOCKED_CLASS = 'pf-locked';

export type LessonPlayerProps = {
  view: StudentLessonView;
  playback: PlaybackDto;
  /** Sends one answer to the server and resolves with its grade (or "queued"); the player holds no answer keys. */
  onAnswer: AnswerSender;
  /** Grades of answers that were queued, as they arrive (each id applied once). */
  arrivals?: readonly GradeArrival[];
  /** Queued answers the server refused for good (each id applied once). */
  refusals?: readonly AnswerRefusal[];
  /** Why answers and explanations are not shown yet when the page's reveal policy holds them back. */
  revealNote?: string | null;
  mode: 'preview' | 'watch';
  onEvent?: (event: LessonPlayerEvent) => void;
  /** Fresh playback URLs (see VideoPlayer). */
  onRefresh?: () => Promise<PlaybackDto | undefined>;
  /** The video.js player, e.g. to report the intervals watched. */
  onPlayer?: (player: Player) => void;
  /** The watch page: the notes were acknowledged before (the acknowledgement is recorded once). */
  safetyAcknowledged?: boolean;
  /** The watch page: grades already recorded, by checkpoint key. */
  initialBook?: AttemptBook;
  className?: string;
  ref?: Ref<LessonPlayerControls>;
};

/**
 * The student player: the video with every checkpoint kind on its pins. It stops exactly at each
 * pause or gate pin, shows asides beside the playing video, keeps an unanswered gate from being
 * passed, shows a prediction's reveal later, and shows only what the server's grade replies say.
 * On wide screens the open panel and the asides sit in a column beside the video (above the
 * chapter and checkpoint lists), growing downwards as far as they need; on phones they follow the
 * video. The root's data-ready turns "true" once pins are watched, data-stop-ms is the pin time of
 * the open panel, data-current-ms the video's time (from its events).
 */
export function LessonPlayer({
  view,
  playback,
  onAnswer,
  mode,
  onEvent,
  onRefresh,
  onPlayer,
  safetyAcknowledged,
  initialBook,
  arrivals,
  refusals,
  revealNote = null,
  className,
  ref,
}: LessonPlayerProps) {
  const lesson = useLessonPlayer({ view, onAnswer, onEvent, safetyAcknowledged, initialBook, arrivals, refusals });
  const { state, player } = lesson;
  const currentMs = useCurrentMs(player);
  const headingRef = useRef<HTMLHeadingElement>(null);
  const panelRef = useRef<HTMLDivElement>(null);
  const overlay = state.overlay;
  const overlayId = overlay ? `${overlay.stop.id}:${overlay.reason}` : null;
  const hadOverlay = useRef(false);
  const { resumeAt } = lesson;
  useImperativeHandle(ref, () => ({ resumeAt }), [resumeAt]);

  // Focus goes into a panel when it opens (scrolled so as much of it shows as fits), and back to the player when it closes.
  useEffect(() => {
    if (overlayId) {
      headingRef.current?.focus({ preventScroll: true });
      panelRef.current?.scrollIntoView?.({ block: 'nearest' });
      hadOverlay.current = true;
    } else if (hadOverlay.current) {
      hadOverlay.current = false;
      const element = player?.el();
      if (element instanceof HTMLElement) element.focus();
    }
  }, [overlayId, player]);

  const started = state.started;
  useEffect(() => {
    const element = player?.el();
    if (!element || player?.isDisposed()) return;
    element.classList.toggle(LOCKED_CLASS, !started);
  }, [player, started]);

  const overlayCheckpoint = overlay ? checkpointAt(view, overlay.stop.key) : undefined;
  const stopName = overlayCheckpoint ? overlayCheckpoint.label.trim() || CHECKPOINT_KIND_LABELS[overlayCheckpoint.kind] : null;
  const errorFor = (key: string) => (lesson.sendError?.key === key ? lesson.sendError.message : null);
  const asides = state.asides.map((key) => checkpointAt(view, key)).filter((c) => c !== undefined);

  return (
    <PlayerLocaleContext.Provider value={view.locale}>
      <div
        className={cn('flex flex-col gap-4', className)}
        data-lesson-player={mode}
        data-ready={lesson.scheduler ? 'true' : 'false'}
        data-stop-ms={overlay ? overlay.stop.atMs : undefined}
        data-stop-id={overlay ? overlay.stop.id : undefined}
        data-current-ms={Math.round(currentMs)}
      >
        {/* Said once when a panel opens, even where moving focus into it is not announced (some phone screen readers). */}
        <p className="sr-only" aria-live="polite">
          {overlay && stopName ? `The video stopped at ${formatTime(overlay.stop.atMs)}: ${stopName}.` : ''}
        </p>
        {!state.started ? <SafetyNotice notes={view.safetyNotes} onAcknowledge={lesson.acknowledgeSafety} /> : null}
        {/* Phones: one column in the order video, panel, asides, shortcuts, lists (the two wrappers are
            "contents" there). Wide screens: the video and shortcuts, and beside them the panel, asides and lists. */}
        <div className="flex flex-col gap-4 lg:grid lg:grid-cols-[minmax(0,1fr)_24rem] lg:items-start">
          <div className="contents lg:flex lg:flex-col lg:gap-4">
            <div className="relative order-1">
              <VideoPlayer
                playback={playback}
                label={mode === 'preview' ? `Preview of ${view.title}` : view.title}
                onRefresh={onRefresh}
                onReady={(created) => {
                  lesson.setPlayer(created);
                  onPlayer?.(created);
                }}
              />
              {!state.started ? (
                <div className="absolute inset-0 flex items-center justify-center rounded-lg bg-ink/80 p-4 text-center font-bold text-surface">
                  Read the safety notes above to start the video.
                </div>
              ) : null}
            </div>
            <KeyboardHelp className="order-3" />
          </div>
          <div className="contents lg:flex lg:flex-col lg:gap-4" data-player-side="">
            {overlay && overlayCheckpoint ? (
              <div ref={panelRef} className="order-2 scroll-mt-4">
                <CheckpointOverlay
                  overlay={overlay}
                  checkpoint={overlayCheckpoint}
                  record={recordOf(state.book, overlay.stop.key)}
                  busy={lesson.busy}
                  sendError={errorFor(overlay.stop.key)}
                  headingRef={headingRef}
                  revealNote={revealNote}
                  onSubmit={(answer) => void lesson.submit(overlay.stop.key, answer)}
                  onSkip={lesson.skip}
                  onContinue={() => lesson.proceed('attempts' in overlayCheckpoint)}
                  onTryAgain={lesson.tryAgain}
                />
              </div>
            ) : null}
            {asides.length > 0 ? (
              <div className="order-2 flex flex-col gap-3" aria-live="polite">
                {asides.map((checkpoint) => (
                  <AsideCard
                    key={checkpoint.key}
                    checkpoint={checkpoint}
                    record={recordOf(state.book, checkpoint.key)}
                    busy={lesson.busy}
                    sendError={errorFor(checkpoint.key)}
                    revealNote={revealNote}
                    onSubmit={(answer) => void lesson.submit(checkpoint.key, answer)}
                    onDismiss={() => lesson.dismissAside(checkpoint.key)}
                  />
                ))}
              </div>
            ) : null}
            <div className="order-4 grid gap-4 md:grid-cols-2 lg:grid-cols-1">
              <ChapterList chapters={view.chapters} currentMs={currentMs} onJump={(ms) => lesson.scheduler?.seekTo(ms)} />
              <CheckpointList
                view={view}
                stops={lesson.stops}
                isDone={(stop) => isStopDone(state, stop)}
                disabled={!state.started || !lesson.scheduler}
                onOpen={lesson.openCheckpoint}
              />
            </div>
          </div>
        </div>
        <CheckpointTicks player={player} view={view} stops={lesson.stops} durationMs={playback.durationSeconds * 1000} />
      </div>
    </PlayerLocaleContext.Provider>
  );
}
