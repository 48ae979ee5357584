import { useState } from 'react';
import { Link } from 'react-router-dom';
import { formatBytes } from '@core/recordings';
import { Button } from '@/components/ui/button';
import { AlertIcon, CheckIcon } from '@/components/ui/icons';
import { paths } from '@/config/paths';
import { cn } from '@/lib/cn';
import { formatRate, formatTimeLeft, percentOf, secondsLeft } from '../upload/transfer-rate';
import type { UploadRow as Row } from '../upload/upload-manager';
import { ConfirmDialog } from '@/components/ui/confirm-dialog';

export type UploadRowActions = {
  pause: (id: string) => void;
  resume: (id: string) => void;
  retry: (id: string) => void;
  cancel: (id: string) => Promise<void>;
  dismiss: (id: string) => void;
};

/** The line under the bar: percent, speed and time left while sending; what happened otherwise. */
export function uploadStatusText(row: Row): string {
  const percent = percentOf(row.bytesSent, row.size);
  switch (row.status) {
    case 'preparing':
      return 'Checking the file…';
    case 'uploading': {
      if (row.rate.bytesPerSecond === null) return `${percent} % · measuring speed…`;
      const left = secondsLeft(row.bytesSent, row.size, row.rate.bytesPerSecond);
      return `${percent} % · ${formatRate(row.rate.bytesPerSecond)} · ${left === null ? 'time left unknown' : formatTimeLeft(left)}`;
    }
    case 'paused':
      return `Paused at ${percent} %`;
    case 'finishing':
      return 'All parts sent — checking the stored file…';
    case 'done':
      return 'Uploaded. Processing has started: follow it in the library below.';
    case 'error':
      return row.problem?.message ?? 'The upload stopped.';
  }
}

/** One file of the queue: name, size, progress, and the actions that fit its state. */
export function UploadRowView({ row, actions }: { row: Row; actions: UploadRowActions }) {
  const [confirming, setConfirming] = useState(false);
  const [cancelling, setCancelling] = useState(false);
  const percent = percentOf(row.bytesSent, row.size);
  const failed = row.status === 'error';
  const label = `Upload of ${row.name}`;

  async function cancel() {
    setCancelling(true);
    await actions.cancel(row.id);
  }

  return (
    <li className="flex flex-col gap-2 border-b border-line px-4 py-3 last:border-b-0">
      <div className="flex flex-wrap items-baseline justify-between gap-x-4">
        <span className="font-bold break-all">{row.name}</span>
        <span className="text-sm text-ink-muted">
          {formatBytes(row.size)}
          {row.resumed ? ' · continued' : ''}
        </span>
      </div>
      {row.status !== 'done' && !(failed && row.problem?.kind === 'refused') ? (
        <div
          role="progressbar"
          aria-label={label}
          aria-valuemin={0}
          aria-valuemax={100}
          aria-valuenow={percent}
          aria-valuetext={`${percent} %`}
          className="h-2.5 overflow-hidden rounded-full bg-sunken"
        >
          <div
            className={cn(
              'h-full rounded-full transition-[width]',
              failed ? 'bg-danger' : row.status === 'paused' ? 'bg-line-strong' : 'bg-teal',
            )}
            style={{ width: `${percent}%` }}
          />
        </div>
      ) : null}
      <p
        className={cn('flex items-start gap-1.5 text-sm', failed ? 'font-bold text-danger' : 'text-ink-muted')}
        role={failed ? 'alert' : undefined}
      >
        {failed ? <AlertIcon className="mt-0.5 size-4 shrink-0" /> : null}
        {row.status === 'done' ? <CheckIcon className="mt-0.5 size-4 shrink-0 text-success" /> : null}
        <span>{uploadStatusText(row)}</span>
      </p>
      <div className="flex flex-wrap gap-2">
        {row.status === 'uploading' ? (
          <Button size="sm" variant="secondary" onClick={() => actions.pause(row.id)} aria-label={`Pause the upload of ${row.name}`}>
            Pause
          </Button>
        ) : null}
        {row.status === 'paused' ? (
          <Button size="sm" variant="secondary" onClick={() => actions.resume(row.id)} aria-label={`Resume the upload of ${row.name}`}>
            Resume
          </Button>
        ) : null}
        {failed && row.problem?.retryable ? (
          <Button size="sm" onClick={() => actions.retry(row.id)} aria-label={`Retry the upload of ${row.name}`}>
            Retry
          </Button>
        ) : null}
        {row.status === 'done' && row.recordingId ? (
          <Link to={paths.teacher.recording(row.recordingId)} className="inline-flex min-h-9 items-center font-bold text-copper underline">
            Open the recording
          </Link>
        ) : null}
        {row.status === 'done' || (failed && !row.problem?.retryable) ? (
          <Button size="sm" variant="ghost" onClick={() => actions.dismiss(row.id)} aria-label={`Remove ${row.name} from the list`}>
            Remove from the list
          </Button>
        ) : (
          <Button size="sm" variant="danger" onClick={() => setConfirming(true)} aria-label={`Cancel the upload of ${row.name}`}>
            Cancel
          </Button>
        )}
      </div>
      <ConfirmDialog
        open={confirming}
        title={`Cancel the upload of “${row.name}”?`}
        confirmLabel="Cancel the upload"
        cancelLabel="Keep uploading"
        busy={cancelling}
        onConfirm={() => void cancel()}
        onCancel={() => setConfirming(false)}
      >
        The parts sent so far are deleted from storage. To add this recording later, upload the file again.
      </ConfirmDialog>
    </li>
  );
}
