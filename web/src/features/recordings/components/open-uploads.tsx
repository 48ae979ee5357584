import { useRef, useState } from 'react';
import type { OpenUploadDto } from '@core/contracts';
import { formatBytes } from '@core/recordings';
import { Button } from '@/components/ui/button';
import { FieldError } from '@/components/ui/field';
import { formatDateTime, type SchoolClock } from '@/lib/format';
import { useDiscardUpload } from '../api/discard-upload';
import { ConfirmDialog } from '@/components/ui/confirm-dialog';

type OpenUploadsProps = {
  uploads: OpenUploadDto[];
  accept: string[] | undefined;
  clock: SchoolClock;
  /** Checks the chosen file against the upload on the API and continues it; rejects with the API's reason. */
  onResume: (upload: OpenUploadDto, file: File) => Promise<void>;
};

/**
 * Uploads started earlier whose file is no longer in the page (a reload, another day): choosing the same
 * file again continues from the parts storage already holds.
 */
export function OpenUploads({ uploads, accept, clock, onResume }: OpenUploadsProps) {
  return (
    <ul aria-label="Unfinished uploads" className="rounded-lg border border-line bg-surface">
      {uploads.map((upload) => (
        <OpenUploadItem key={upload.id} upload={upload} accept={accept} clock={clock} onResume={onResume} />
      ))}
    </ul>
  );
}

function OpenUploadItem({ upload, accept, clock, onResume }: { upload: OpenUploadDto } & Omit<OpenUploadsProps, 'uploads'>) {
  const inputRef = useRef<HTMLInputElement>(null);
  const [checking, setChecking] = useState(false);
  const [problem, setProblem] = useState<string | undefined>();
  const [confirming, setConfirming] = useState(false);
  const discard = useDiscardUpload();

  async function choose(file: File | undefined) {
    if (!file) return;
    setChecking(true);
    setProblem(undefined);
    try {
      await onResume(upload, file);
    } catch (error) {
      setProblem(error instanceof Error ? error.message : 'This file could not be matched with the upload. Try again.');
    } finally {
      setChecking(false);
    }
  }

  return (
    <li className="flex flex-col gap-2 border-b border-line px-4 py-3 last:border-b-0">
      <div className="flex flex-wrap items-baseline justify-between gap-x-4">
        <span className="font-bold break-all">{upload.fileName}</span>
        <span className="text-sm text-ink-muted">Started {formatDateTime(upload.createdAt, clock)}</span>
      </div>
      <p className="text-sm">
        {formatBytes(upload.uploadedBytes)} of {formatBytes(upload.size)} stored. Choose the same file again to send the rest.
      </p>
      <FieldError message={problem} />
      <div className="flex flex-wrap gap-2">
        <Button
          size="sm"
          busy={checking}
          onClick={() => inputRef.current?.click()}
          aria-label={`Choose the file again for ${upload.fileName}`}
        >
          {checking ? 'Checking the file…' : 'Choose the file again'}
        </Button>
        <Button size="sm" variant="danger" onClick={() => setConfirming(true)} aria-label={`Discard the upload of ${upload.fileName}`}>
          Discard
        </Button>
      </div>
      <input
        ref={inputRef}
        type="file"
        accept={accept?.join(',')}
        aria-label={`File for ${upload.fileName}`}
        tabIndex={-1}
        className="sr-only"
        onChange={(event) => {
          void choose(event.target.files?.[0]);
          event.target.value = '';
        }}
      />
      <ConfirmDialog
        open={confirming}
        title={`Discard “${upload.fileName}”?`}
        confirmLabel="Discard the upload"
        cancelLabel="Keep it"
        busy={discard.isPending}
        error={discard.isError ? discard.error.message : undefined}
        onConfirm={() => discard.mutate(upload.id, { onSuccess: () => setConfirming(false) })}
        onCancel={() => {
          discard.reset();
          setConfirming(false);
        }}
      >
        The {formatBytes(upload.uploadedBytes)} already stored are deleted, and the recording leaves the library.
      </ConfirmDialog>
    </li>
  );
}
