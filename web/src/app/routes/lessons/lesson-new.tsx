import { Link, useNavigate, useSearchParams } from 'react-router-dom';
import { BackLink } from '@/components/ui/back-link';
import { Banner } from '@/components/ui/banner';
import { Card } from '@/components/ui/card';
import { EmptyState } from '@/components/ui/empty-state';
import { ErrorBanner } from '@/components/ui/error-banner';
import { UploadIcon } from '@/components/ui/icons';
import { PageHeader } from '@/components/ui/page-header';
import { Loading } from '@/components/ui/spinner';
import { paths } from '@/config/paths';
import { useReadyRecordings } from '@/features/lessons/api/get-ready-recordings';
import { LessonCreateForm } from '@/features/lessons/components/lesson-create-form';
import { lessonPaths } from '@/features/lessons/section-base';

/** A new lesson on one of the school's ready recordings (`?recording=<id>` chooses it); then on to the studio. */
export default function LessonNewRoute() {
  const navigate = useNavigate();
  const [params] = useSearchParams();
  const wanted = params.get('recording');
  const recordings = useReadyRecordings();
  const list = recordings.data;
  const wantedMissing = Boolean(wanted && list && !list.some((recording) => recording.id === wanted));
  const to = lessonPaths('/teacher');
  return (
    <>
      <BackLink to={to.list}>Lessons</BackLink>
      <PageHeader
        title="New lesson"
        description="Choose the recording and describe the lesson. You pin the checkpoints next, in the studio."
      />
      {recordings.isPending ? <Loading label="Loading ready recordings…" /> : null}
      {recordings.isError ? <ErrorBanner error={recordings.error} title="The recordings could not be loaded" /> : null}
      {list && list.length === 0 ? (
        <EmptyState icon={<UploadIcon className="size-8" />} title="No ready recording yet">
          A lesson is built on a recording that finished processing. Upload one on the{' '}
          <Link to={paths.teacher.recordings} className="font-bold text-copper underline">
            Recordings page
          </Link>
          ; it is ready a few minutes later.
        </EmptyState>
      ) : null}
      {list && list.length > 0 ? (
        <Card aria-label="Lesson settings" className="max-w-3xl">
          {wantedMissing ? (
            <Banner tone="info" className="mb-5" title="That recording cannot carry a lesson yet">
              It is still processing, failed, or was deleted. Choose a ready recording below, or come back when it is ready.
            </Banner>
          ) : null}
          <LessonCreateForm recordings={list} initialRecordingId={wanted} onCreated={(lesson) => void navigate(to.studio(lesson.id))} />
        </Card>
      ) : null}
    </>
  );
}
