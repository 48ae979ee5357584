import { useState } from 'react';
import type { RecordingDto } from '@core/contracts';
import { Banner } from '@/components/ui/banner';
import { Button } from '@/components/ui/button';
import { isApiError } from '@/lib/api-client';
import { useDeleteRecording } from '../api/delete-recording';
import { ConfirmDialog } from '@/components/ui/confirm-dialog';
import { RecordingUsedBy } from './recording-used-by';

type DeleteRecordingProps = { recording: RecordingDto; onDeleted?: () => void; size?: 'sm' | 'md' };

/** Delete, after a confirmation that says everything stored for the recording goes with it. */
export function DeleteRecording({ recording, onDeleted, size = 'sm' }: DeleteRecordingProps) {
  const [confirming, setConfirming] = useState(false);
  const mutation = useDeleteRecording();
  if (!recording.canEdit) return null;
  // The server refuses while lessons are built on the recording; its sentence names them.
  const inUse = mutation.isError && isApiError(mutation.error) && mutation.error.code === 'recording_in_use' ? mutation.error : null;
  return (
    <>
      <Button size={size} variant="danger" onClick={() => setConfirming(true)} aria-label={`Delete ${recording.title}`}>
        Delete
      </Button>
      <ConfirmDialog
        open={confirming}
        title={`Delete “${recording.title}”?`}
        confirmLabel="Delete the recording"
        cancelLabel="Keep it"
        busy={mutation.isPending}
        error={mutation.isError && !inUse ? mutation.error.message : undefined}
        onConfirm={() =>
          mutation.mutate(recording.id, {
            onSuccess: () => {
              setConfirming(false);
              onDeleted?.();
            },
          })
        }
        onCancel={() => {
          mutation.reset();
          setConfirming(false);
        }}
      >
        {inUse ? (
          <Banner tone="error" title="The recording was not deleted">
            <p>{inUse.message}</p>
            <RecordingUsedBy recording={recording} className="mt-1" />
          </Banner>
        ) : (
          <>
            The original file, the web version, the poster, the thumbnails and the captions are all deleted. This cannot be undone.
            {recording.usedBy.length > 0 ? <RecordingUsedBy recording={recording} className="mt-2 text-ink" /> : null}
          </>
        )}
      </ConfirmDialog>
    </>
  );
}
