import { useState } from 'react';
import type { RecordingDto } from '@core/contracts';
import { Button } from '@/components/ui/button';
import { useDeleteRecording } from '../api/delete-recording';
import { ConfirmDialog } from './confirm-dialog';

type DeleteRecordingProps = { recording: RecordingDto; onDeleted?: () => void; size?: 'sm' | 'md' };

/** Delete, after a confirmation that says everything stored for the recording goes with it. */
export function DeleteRecording({ recording, onDeleted, size = 'sm' }: DeleteRecordingProps) {
  const [confirming, setConfirming] = useState(false);
  const mutation = useDeleteRecording();
  if (!recording.canEdit) return null;
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
        error={mutation.isError ? mutation.error.message : undefined}
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
        The original file, the web version, the poster, the thumbnails and the captions are all deleted. This cannot be undone.
      </ConfirmDialog>
    </>
  );
}
