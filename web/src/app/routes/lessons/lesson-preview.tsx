import { useState } from 'react';
import { useParams } from 'react-router-dom';
import { BackLink } from '@/components/ui/back-link';
import { Banner } from '@/components/ui/banner';
import { Button } from '@/components/ui/button';
import { ErrorBanner } from '@/components/ui/error-banner';
import { Loading } from '@/components/ui/spinner';
import { lessonPaths, useSectionBase } from '@/features/lessons/section-base';
import { useAnswerPreview, useLessonPreview, usePreviewPlayback } from '@/features/player/api/preview-api';
import { LessonPlayer } from '@/features/player/lesson-player';

/** The draft in the student player: answers are graded by the server like a student's, nothing is recorded. */
export default function LessonPreviewRoute() {
  const { lessonId = '' } = useParams();
  const to = lessonPaths(useSectionBase());
  const view = useLessonPreview(lessonId);
  const playback = usePreviewPlayback(lessonId);
  const answer = useAnswerPreview(lessonId);
  // A new run remounts the player: local attempts, overlays and the video position start again.
  const [run, setRun] = useState(0);
  const refetchView = view.refetch;
  const refetchPlayback = playback.refetch;

  return (
    <>
      <BackLink to={to.overview(lessonId)}>Back to the lesson</BackLink>
      <div className="mb-4 flex flex-col gap-3 sm:flex-row sm:items-start sm:justify-between">
        <h1 className="text-2xl font-bold break-words">{view.data ? `Preview: ${view.data.title}` : 'Lesson preview'}</h1>
        <Button
          variant="secondary"
          disabled={!view.data || !playback.data}
          onClick={() => {
            void refetchView().then(() => setRun((n) => n + 1));
          }}
        >
          Restart preview
        </Button>
      </div>
      <Banner tone="info" title="Preview" className="mb-4">
        <p>Answers are graded as a student’s would be, and nothing is recorded.</p>
      </Banner>
      {view.isPending || playback.isPending ? <Loading label="Preparing the preview…" /> : null}
      {view.isError && !view.data ? <ErrorBanner error={view.error} title="The lesson could not be loaded for preview" /> : null}
      {playback.isError && !playback.data ? <ErrorBanner error={playback.error} title="The recording could not be loaded" /> : null}
      {view.data && playback.data ? (
        <LessonPlayer
          key={run}
          view={view.data}
          playback={playback.data}
          mode="preview"
          onAnswer={(key, checkpointAnswer, attempt) =>
            answer
              .mutateAsync({ key, answer: checkpointAnswer, attempt })
              .then((grade) => ({ status: 'graded', grade, feedbackHidden: false }) as const)
          }
          onRefresh={() => refetchPlayback().then((result) => result.data)}
        />
      ) : null}
    </>
  );
}
