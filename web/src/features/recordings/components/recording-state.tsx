import type { RecordingDto } from '@core/contracts';
import { Badge } from '@/components/ui/badge';
import { Button } from '@/components/ui/button';
import { FieldError } from '@/components/ui/field';
import { useRetryRecording } from '../api/retry-recording';

/** The state as a short badge: uploading, processing with its percentage, ready or failed. */
export function RecordingStateBadge({ recording, uploadPercent }: { recording: RecordingDto; uploadPercent?: number }) {
  switch (recording.state) {
    case 'uploading':
      return <Badge tone="copper">{uploadPercent === undefined ? 'Uploading' : `Uploading ${uploadPercent} %`}</Badge>;
    case 'processing':
      return <Badge tone="field">Processing {recording.progress} %</Badge>;
    case 'ready':
      return <Badge tone="success">Ready</Badge>;
    case 'failed':
      return <Badge tone="danger">Failed</Badge>;
  }
}

/** Badge, the failure's sentence, and Retry when processing again can help and the caller may ask for it. */
export function RecordingState({ recording, uploadPercent }: { recording: RecordingDto; uploadPercent?: number }) {
  const retry = useRetryRecording();
  const failure = recording.state === 'failed' ? recording.failure : null;
  return (
    <div className="flex min-w-40 flex-col items-start gap-1.5">
      <RecordingStateBadge recording={recording} uploadPercent={uploadPercent} />
      {recording.state === 'uploading' && uploadPercent === undefined ? (
        <span className="text-sm text-ink-muted">Not finished: continue it under “Unfinished uploads”.</span>
      ) : null}
      {failure ? <p className="text-sm">{failure.message}</p> : null}
      {failure?.retryable && recording.canEdit ? (
        <Button
          size="sm"
          variant="secondary"
          busy={retry.isPending}
          onClick={() => retry.mutate(recording.id)}
          aria-label={`Retry processing ${recording.title}`}
        >
          Retry processing
        </Button>
      ) : null}
      <FieldError message={retry.isError ? retry.error.message : undefined} />
    </div>
  );
}
