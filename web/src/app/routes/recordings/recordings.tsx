import { useCallback, useState } from 'react';
import { useSearchParams } from 'react-router-dom';
import type { RecordingDto, RecordingListQuery } from '@core/contracts';
import { EmptyState } from '@/components/ui/empty-state';
import { ErrorBanner } from '@/components/ui/error-banner';
import { UploadIcon } from '@/components/ui/icons';
import { LiveRegion } from '@/components/ui/live-region';
import { PageHeader } from '@/components/ui/page-header';
import { Loading } from '@/components/ui/spinner';
import { useOpenUploads } from '@/features/recordings/api/get-open-uploads';
import { useRecordings } from '@/features/recordings/api/get-recordings';
import { LibraryFilterBar } from '@/features/recordings/components/library-filter-bar';
import { OpenUploads } from '@/features/recordings/components/open-uploads';
import { RecordingTable } from '@/features/recordings/components/recording-table';
import { UploadQueue } from '@/features/recordings/components/upload-queue';
import { UploadZone } from '@/features/recordings/components/upload-zone';
import { readLibraryFilters, writeLibraryFilters } from '@/features/recordings/library-filters';
import { describeStateChanges } from '@/features/recordings/state-announcements';
import { percentOf } from '@/features/recordings/upload/transfer-rate';
import { useUploadManager, useUploadRows } from '@/features/recordings/upload/use-upload-manager';
import { plural } from '@/lib/format';
import { useSchoolClock } from '../homes/use-school-clock';

/** The teacher's recordings: upload (and continue unfinished uploads), then the school's library with live states. */
export default function RecordingsRoute() {
  const clock = useSchoolClock();
  const manager = useUploadManager();
  const rows = useUploadRows(manager);
  const open = useOpenUploads();
  const [params, setParams] = useSearchParams();
  const filters = readLibraryFilters(params);
  const recordings = useRecordings(filters);
  const announcement = useStateAnnouncement(recordings.data?.recordings);

  const changeFilters = useCallback(
    (update: (current: RecordingListQuery) => RecordingListQuery, options: { replace: boolean }) =>
      setParams((current) => writeLibraryFilters(update(readLibraryFilters(current))), options),
    [setParams],
  );

  const uploadPercents = new Map(
    rows
      .filter((row) => row.recordingId && row.status !== 'done')
      .map((row) => [row.recordingId as string, percentOf(row.bytesSent, row.size)]),
  );
  const inQueue = new Set(rows.map((row) => row.uploadId).filter(Boolean));
  const unfinished = open.data?.uploads.filter((upload) => !inQueue.has(upload.id)) ?? [];
  const filtered = Boolean(filters.q || filters.state || filters.owner !== 'school');
  const list = recordings.data?.recordings;

  return (
    <>
      <PageHeader
        title="Recordings"
        description="Upload your demonstration videos. Pinfield prepares a version that plays in every browser and keeps your original."
      />
      <section aria-labelledby="add-heading" className="flex flex-col gap-4">
        <h2 id="add-heading" className="text-2xl">
          Add recordings
        </h2>
        {open.isError ? <ErrorBanner error={open.error} title="Upload limits and unfinished uploads could not be loaded" /> : null}
        <UploadZone limits={open.data?.limits} onFiles={(files) => manager.addFiles(files)} />
        <UploadQueue
          rows={rows}
          actions={{
            pause: (id) => manager.pause(id),
            resume: (id) => manager.resume(id),
            retry: (id) => manager.retry(id),
            cancel: (id) => manager.cancel(id),
            dismiss: (id) => manager.dismiss(id),
          }}
        />
      </section>

      {unfinished.length > 0 ? (
        <section aria-labelledby="unfinished-heading" className="mt-10 flex flex-col gap-4">
          <h2 id="unfinished-heading" className="text-2xl">
            Unfinished uploads
          </h2>
          <p className="text-ink-muted">
            These stopped before all of the file was sent. The browser cannot reopen a file by itself: choose it again and only the missing
            part is sent.
          </p>
          <OpenUploads
            uploads={unfinished}
            accept={open.data?.limits.accept}
            clock={clock}
            onResume={(upload, file) => manager.resumeWith(upload, file)}
          />
        </section>
      ) : null}

      <section aria-labelledby="library-heading" className="mt-10 flex flex-col gap-2">
        <h2 id="library-heading" className="text-2xl">
          Library
        </h2>
        <LibraryFilterBar filters={filters} onChange={changeFilters} />
        <LiveRegion className="sr-only">{announcement}</LiveRegion>
        {recordings.isPending ? <Loading label="Loading recordings…" /> : null}
        {recordings.isError ? <ErrorBanner error={recordings.error} title="The recordings could not be loaded" /> : null}
        {list && list.length === 0 && !filtered ? (
          <EmptyState icon={<UploadIcon className="size-8" />} title="No recordings yet">
            Upload a video above. It appears here at once, and is ready to play a few minutes later.
          </EmptyState>
        ) : null}
        {list && (list.length > 0 || filtered) ? (
          <>
            <p className="text-ink-muted">
              {plural(list.length, 'recording')}
              {recordings.isFetching && recordings.isPlaceholderData ? ' · updating…' : ''}
            </p>
            <RecordingTable recordings={list} clock={clock} uploadPercents={uploadPercents} empty="No recording matches these filters." />
          </>
        ) : null}
      </section>
    </>
  );
}

/** A sentence for screen readers when a recording becomes ready, fails or starts processing. */
function useStateAnnouncement(recordings: RecordingDto[] | undefined): string {
  const [previous, setPrevious] = useState(recordings);
  const [message, setMessage] = useState('');
  if (recordings !== previous) {
    setPrevious(recordings);
    const change = describeStateChanges(previous, recordings);
    if (change) setMessage(change);
  }
  return message;
}
