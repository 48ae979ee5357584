import { useQuery } from '@tanstack/react-query';
import { Link, useParams, useSearchParams } from 'react-router-dom';
import { Banner } from '@/components/ui/banner';
import { buttonVariants } from '@/components/ui/button';
import { ErrorBanner } from '@/components/ui/error-banner';
import { Loading } from '@/components/ui/spinner';
import { CheckpointForm } from '@/features/checkpoint-forms/checkpoint-form';
import { lessonQueryOptions } from '@/features/lessons/api/get-lesson';
import { useLessonPaths } from '@/features/lessons/section-base';
import { VideoPlayer } from '@/features/player/video-player';
import { lessonPlaybackQueryOptions } from '@/features/studio/api/get-lesson-media';
import { StudioScreen } from '@/features/studio/studio-screen';
import { useSchoolClock } from '../homes/use-school-clock';

/** The lesson studio (a teacher's lessons, a substitute's own copies): pin checkpoints on the recording, edit them, preview and publish. */
export default function LessonStudioRoute() {
  const { lessonId = '' } = useParams();
  const [search] = useSearchParams();
  const clock = useSchoolClock();
  // The studio keeps its own copy of the draft: a background refetch must not replace what is being typed.
  const lesson = useQuery({ ...lessonQueryOptions(lessonId), refetchOnWindowFocus: false });
  const canOpen = lesson.data?.canEdit === true && lesson.data.recording.ready;
  const playback = useQuery({ ...lessonPlaybackQueryOptions(lessonId), enabled: canOpen });
  const lessonPaths = useLessonPaths();
  const overviewTo = lessonPaths.overview(lessonId);
  const previewTo = lessonPaths.preview(lessonId);

  if (lesson.isPending) return <Loading label="Opening the studio…" />;
  if (lesson.isError) return <ErrorBanner error={lesson.error} title="This lesson could not be opened in the studio" />;
  const data = lesson.data;
  if (!data.canEdit) {
    return (
      <Banner tone="info" title="Only the lesson’s owner edits it">
        <p>You can preview “{data.title}” as a student, or duplicate it into your own library from its overview page and edit the copy.</p>
        <div className="mt-2 flex flex-wrap gap-2">
          <Link to={previewTo} className={buttonVariants({ variant: 'secondary', size: 'sm' })}>
            Preview as student
          </Link>
          <Link to={overviewTo} className={buttonVariants({ variant: 'secondary', size: 'sm' })}>
            Lesson overview
          </Link>
        </div>
      </Banner>
    );
  }
  if (!data.recording.ready) {
    return (
      <Banner tone="error" title="The recording of this lesson is not ready">
        <p>
          “{data.recording.title}” cannot be played at the moment (it may be reprocessing or its files were removed). Check it in the
          recordings library.
        </p>
      </Banner>
    );
  }
  if (playback.isPending) return <Loading label="Preparing the video…" />;
  if (playback.isError) return <ErrorBanner error={playback.error} title="The video of this lesson could not be loaded" />;
  const media = playback.data;
  return (
    <StudioScreen
      key={lessonId}
      lesson={data}
      playback={media}
      clock={clock}
      previewTo={previewTo}
      overviewTo={overviewTo}
      initialProblemPath={search.get('problem')}
      renderPlayer={(onReady) => (
        <VideoPlayer
          playback={media}
          onReady={onReady}
          onRefresh={async () => (await playback.refetch()).data}
          label={`Video of ${data.recording.title}`}
        />
      )}
      renderCheckpointForm={(form) => <CheckpointForm {...form} />}
    />
  );
}
