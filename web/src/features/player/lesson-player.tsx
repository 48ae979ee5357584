import { useEffect, useRef } from 'react';
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
};

/**
 * The student player: the video with every checkpoint kind on its pins. It stops exactly at each
 * pause or gate pin, shows asides beside the playing video, keeps an unanswered gate from being
 * passed, shows a prediction's reveal later, and shows only what the server's grade replies say.
 * The root's data-ready turns "true" once pins are watched, data-stop-ms is the pin time of the open
 * panel, data-current-ms the video's time (from its events).
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
}: LessonPlayerProps) {
  const lesson = useLessonPlayer({ view, onAnswer, onEvent, safetyAcknowledged, initialBook, arrivals, refusals });
  const { state, player } = lesson;
  const currentMs = useCurrentMs(player);
  const headingRef = useRef<HTMLHeadingElement>(null);
  const overlay = state.overlay;
  const overlayId = overlay ? `${overlay.stop.id}:${overlay.reason}` : null;
  const hadOverlay = useRef(false);

  // Focus goes into a panel when it opens, and back to the player when it closes.
  useEffect(() => {
    if (overlayId) {
      headingRef.current?.focus();
      hadOverlay.current = true;
    } else if (hadOverlay.current) {
      hadOverlay.current = false;
      const element = player?.el();
      if (element instanceof HTMLElement) element.focus();
    }
  }, [overlayId, player]);

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
        <div className="relative">
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
          {overlay && overlayCheckpoint ? (
            <div className="mt-3 md:absolute md:inset-0 md:mt-0 md:overflow-y-auto md:bg-ink/70 md:p-6">
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
        </div>
        <CheckpointTicks player={player} view={view} stops={lesson.stops} durationMs={playback.durationSeconds * 1000} />
        {asides.length > 0 ? (
          <div className="flex flex-col gap-3" aria-live="polite">
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
        <KeyboardHelp />
        <div className="grid gap-4 md:grid-cols-2">
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
    </PlayerLocaleContext.Provider>
  );
}
