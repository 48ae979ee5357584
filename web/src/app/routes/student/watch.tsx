import { useEffect, useRef, useState } from 'react';
import { useParams } from 'react-router-dom';
import { CHECKPOINT_KIND_LABELS } from '@core/contracts';
import { formatTime } from '@core/lessons/time-format';
import { RichText } from '@/components/rich-text/rich-text';
import { BackLink } from '@/components/ui/back-link';
import { Banner } from '@/components/ui/banner';
import { Loading } from '@/components/ui/spinner';
import { paths } from '@/config/paths';
import { activeMembership } from '@/features/auth/api/get-me';
import { useSignedInMe } from '@/features/auth/components/me-context';
import { SchoolRulesLine } from '@/features/player/components/safety-notice';
import { LessonPlayer, type LessonPlayerControls, type LessonPlayerEvent } from '@/features/player/lesson-player';
import type { Player } from '@/features/player/video-player';
import { useAcknowledgeSafety } from '@/features/watch/api/acknowledge-safety';
import { useWatchView } from '@/features/watch/api/get-watch-view';
import { CompletionSummary } from '@/features/watch/components/completion-summary';
import { RefusedAnswers } from '@/features/watch/components/refused-answers';
import { ResumeOffer } from '@/features/watch/components/resume-offer';
import { SendStatus } from '@/features/watch/components/send-status';
import { WatchHeader } from '@/features/watch/components/watch-header';
import { WatchUnavailable } from '@/features/watch/components/watch-unavailable';
import { currentState, revealNote } from '@/features/watch/logic/watch-text';
import { useAnswerOutbox } from '@/features/watch/outbox/use-answer-outbox';
import { useOnline } from '@/features/watch/use-online';
import { useWatchAnswers } from '@/features/watch/use-watch-answers';
import { useViewingReports } from '@/features/watch/viewing/use-viewing-reports';

/**
 * A student watches an assigned lesson: the safety notes first (acknowledged once), then the player,
 * with every answer kept on this device until the server recorded it, what was watched reported
 * as it is watched, and the offer to go on where they stopped.
 */
export default function WatchRoute() {
  const { assignmentId = '' } = useParams();
  const me = useSignedInMe();
  const membership = activeMembership(me);
  const { outbox, session, status } = useAnswerOutbox({ userId: me.user.id, role: me.active.role, csrfToken: me.csrfToken });
  const watch = useWatchView(assignmentId);
  const data = watch.data;
  const answers = useWatchAnswers({ assignmentId, userId: me.user.id, schoolId: me.active.schoolId, view: data, outbox });
  const online = useOnline();
  const acknowledge = useAcknowledgeSafety(assignmentId);
  const [player, setPlayer] = useState<Player | null>(null);
  const controls = useRef<LessonPlayerControls>(null);
  const [acknowledgedNow, setAcknowledgedNow] = useState(false);
  const [resumeAnswered, setResumeAnswered] = useState(false);
  const { reportCompletion } = answers;

  useViewingReports({
    player,
    assignmentId,
    durationMs: data ? Math.round(data.playback.durationSeconds * 1000) : 0,
    session,
    onResult: (result) => reportCompletion(result.completion, result.serverTime),
  });

  // Once the video plays, the resume offer has had its moment.
  useEffect(() => {
    if (!player) return;
    const played = () => setResumeAnswered(true);
    player.on('play', played);
    return () => {
      if (!player.isDisposed()) player.off('play', played);
    };
  }, [player]);

  const homeHref = paths.student.home;
  const resultsHref = paths.student.results(assignmentId);
  const back = <BackLink to={homeHref}>Back to your lessons</BackLink>;
  if (watch.isPending) {
    return (
      <>
        {back}
        <Loading label="Opening the lesson…" />
      </>
    );
  }
  if (!data) {
    return (
      <>
        {back}
        <WatchUnavailable error={watch.error} homeHref={homeHref} resultsHref={resultsHref} onRetry={() => void watch.refetch()} />
      </>
    );
  }

  const clock = { timeZone: data.assignment.timeZone, locale: membership?.locale ?? 'en-GB' };
  const notes = data.view.safetyNotes.trim();
  const acknowledged = data.progress.safetyAcknowledged || acknowledgedNow;
  const started = notes === '' || acknowledged;
  const resumeMs = data.progress.resumeMs;
  const completion = answers.completion ?? data.progress.completion;
  const nameOf = (key: string) => {
    const checkpoint = data.view.checkpoints.find((c) => c.key === key);
    if (!checkpoint) return key;
    return `${checkpoint.label.trim() || CHECKPOINT_KIND_LABELS[checkpoint.kind]} at ${formatTime(checkpoint.atMs)}`;
  };
  const onEvent = (event: LessonPlayerEvent) => {
    if (event.type !== 'safety-acknowledged') return;
    setAcknowledgedNow(true);
    acknowledge.mutate();
  };

  return (
    <>
      {back}
      <div className="flex flex-col gap-4">
        <WatchHeader watch={data} state={currentState(data.assignment.state, completion)} clock={clock} resultsHref={resultsHref} />
        <div className="grid gap-3 md:grid-cols-2">
          <SendStatus status={status} online={online} anyGiven={answers.anyGiven} name={me.user.name} onRetry={() => outbox.retryNow()} />
          <CompletionSummary completion={completion} />
        </div>
        <RefusedAnswers items={answers.refused} nameOf={nameOf} onDismiss={answers.dismissRefused} />
        {acknowledge.isError ? (
          <Banner tone="error" title="Your reading of the safety notes was not recorded yet">
            <p>{acknowledge.error.message} You will be asked again the next time you open this lesson.</p>
          </Banner>
        ) : null}
        {started && resumeMs > 0 && !resumeAnswered && player ? (
          <ResumeOffer
            resumeMs={resumeMs}
            onResume={() => {
              setResumeAnswered(true);
              // A seek like any other, except that notes and equation cards before the point count as seen.
              controls.current?.resumeAt(resumeMs);
            }}
            onDismiss={() => setResumeAnswered(true)}
          />
        ) : null}
        {notes !== '' && data.progress.safetyAcknowledged ? (
          <details className="rounded-md border-l-4 border-copper bg-copper-soft px-4 py-2">
            <summary className="min-h-9 cursor-pointer py-1 font-bold">Safety notes (read before)</summary>
            <RichText markdown={notes} />
            <SchoolRulesLine notes={notes} />
          </details>
        ) : null}
        {answers.initialBook ? (
          <LessonPlayer
            key={assignmentId}
            ref={controls}
            view={data.view}
            playback={data.playback}
            mode="watch"
            onAnswer={answers.onAnswer}
            arrivals={answers.arrivals}
            refusals={answers.refusals}
            revealNote={revealNote(data, clock)}
            initialBook={answers.initialBook}
            safetyAcknowledged={data.progress.safetyAcknowledged}
            onEvent={onEvent}
            onPlayer={setPlayer}
            onRefresh={() => watch.refetch().then((result) => result.data?.playback)}
          />
        ) : (
          <Loading label="Reading the answers kept on this device…" />
        )}
      </div>
    </>
  );
}
