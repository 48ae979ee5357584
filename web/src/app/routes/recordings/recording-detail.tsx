import { useNavigate, useParams } from 'react-router-dom';
import type { RecordingDetailDto } from '@core/contracts';
import { BackLink } from '@/components/ui/back-link';
import { buttonVariants } from '@/components/ui/button';
import { Card } from '@/components/ui/card';
import { ErrorBanner } from '@/components/ui/error-banner';
import { LiveRegion } from '@/components/ui/live-region';
import { Loading } from '@/components/ui/spinner';
import { paths } from '@/config/paths';
import { recordingDownloadUrl, useRecording } from '@/features/recordings/api/get-recording';
import { CaptionForm } from '@/features/recordings/components/caption-form';
import { CaptionList } from '@/features/recordings/components/caption-list';
import { DeleteRecording } from '@/features/recordings/components/delete-recording';
import { MakeLessonLink } from '@/features/recordings/components/make-lesson-link';
import { RecordingUsedBy } from '@/features/recordings/components/recording-used-by';
import { RecordingFacts } from '@/features/recordings/components/recording-facts';
import { RecordingPlayer } from '@/features/recordings/components/recording-player';
import { RecordingPoster } from '@/features/recordings/components/recording-poster';
import { RecordingState } from '@/features/recordings/components/recording-state';
import { RecordingTitle } from '@/features/recordings/components/recording-title';
import { useSchoolClock } from '../homes/use-school-clock';

// Failures after which the API deleted the stored original: there is nothing to download.
const ORIGINAL_GONE = new Set(['size_mismatch', 'too_large', 'quota_exceeded', 'empty']);

function hasOriginal(recording: RecordingDetailDto): boolean {
  if (recording.state === 'uploading') return false;
  return !(recording.state === 'failed' && recording.failure && ORIGINAL_GONE.has(recording.failure.code));
}

function StateNote({ recording }: { recording: RecordingDetailDto }) {
  if (recording.state === 'processing') {
    return <p className="text-ink-muted">Pinfield is preparing the web version. The preview appears here when it is ready.</p>;
  }
  if (recording.state === 'uploading') {
    return <p className="text-ink-muted">The file has not been fully uploaded yet. Continue it on the Recordings page.</p>;
  }
  if (recording.state === 'failed') return <p className="text-ink-muted">There is no preview: processing did not finish.</p>;
  return null;
}

/** One recording: preview with captions, what is known about the file, the original for download, and its captions. */
export default function RecordingDetailRoute() {
  const { recordingId = '' } = useParams();
  const navigate = useNavigate();
  const clock = useSchoolClock();
  const detail = useRecording(recordingId);
  const recording = detail.data;
  return (
    <>
      <BackLink to={paths.teacher.recordings}>Recordings</BackLink>
      {detail.isPending ? <Loading label="Loading the recording…" /> : null}
      {detail.isError && !recording ? <ErrorBanner error={detail.error} title="This recording could not be loaded" /> : null}
      {recording ? (
        <>
          <div className="mb-6 flex flex-wrap items-start justify-between gap-4">
            <div className="min-w-0">
              <RecordingTitle recording={recording} as="heading" />
              <RecordingUsedBy recording={recording} className="mt-1" />
            </div>
            <div className="flex flex-wrap gap-2">
              <MakeLessonLink recording={recording} />
              {hasOriginal(recording) ? (
                <a href={recordingDownloadUrl(recording.id)} className={buttonVariants({ variant: 'secondary' })}>
                  Download original
                </a>
              ) : null}
              <DeleteRecording recording={recording} size="md" onDeleted={() => void navigate(paths.teacher.recordings)} />
            </div>
          </div>
          <div className="grid gap-6 lg:grid-cols-[minmax(0,3fr)_minmax(0,2fr)]">
            <section aria-labelledby="preview-heading" className="flex flex-col gap-3">
              <h2 id="preview-heading" className="sr-only">
                Preview
              </h2>
              <LiveRegion>
                <RecordingState recording={recording} />
              </LiveRegion>
              {recording.state === 'ready' ? (
                <RecordingPlayer recordingId={recording.id} title={recording.title} />
              ) : (
                <>
                  <RecordingPoster url={recording.posterUrl} title={recording.title} className="w-full" />
                  <StateNote recording={recording} />
                </>
              )}
            </section>
            <Card aria-labelledby="facts-heading">
              <h2 id="facts-heading" className="mb-3 text-xl">
                About the file
              </h2>
              <RecordingFacts recording={recording} clock={clock} />
            </Card>
          </div>
          <section aria-labelledby="captions-heading" className="mt-10 flex flex-col gap-4">
            <h2 id="captions-heading" className="text-2xl">
              Captions
            </h2>
            <CaptionList recordingId={recording.id} captions={recording.captions} canEdit={recording.canEdit} />
            {recording.canEdit ? (
              <Card aria-labelledby="add-caption-heading">
                <h3 id="add-caption-heading" className="mb-3 text-xl">
                  Add captions
                </h3>
                <CaptionForm recordingId={recording.id} />
              </Card>
            ) : null}
          </section>
        </>
      ) : null}
    </>
  );
}
