import { useState } from 'react';
import type { AssignmentDto } from '@core/contracts';
import { Button } from '@/components/ui/button';
import { ConfirmDialog } from '@/components/ui/confirm-dialog';
import { useDeleteAssignment } from '../api/delete-assignment';

/** Deletes an assignment nobody has answered; once answers exist the server refuses and says how many. */
export function DeleteAssignment({ assignment, onDeleted }: { assignment: AssignmentDto; onDeleted: () => void }) {
  const remove = useDeleteAssignment();
  const [confirming, setConfirming] = useState(false);
  return (
    <div className="flex flex-col items-start gap-1">
      <Button variant="danger" onClick={() => setConfirming(true)}>
        Delete the assignment
      </Button>
      <p className="text-sm text-ink-muted">
        Possible while no student has answered. Once there are answers, the assignment stays with its results: change its dates instead.
      </p>
      <ConfirmDialog
        open={confirming}
        title={`Delete “${assignment.lesson.title}” for ${assignment.class.name}?`}
        confirmLabel="Delete the assignment"
        cancelLabel="Keep it"
        busy={remove.isPending}
        error={remove.isError ? remove.error.message : undefined}
        onConfirm={() =>
          remove.mutate(assignment.id, {
            onSuccess: () => {
              setConfirming(false);
              onDeleted();
            },
          })
        }
        onCancel={() => {
          remove.reset();
          setConfirming(false);
        }}
      >
        The class no longer sees this lesson. The lesson and its versions stay. This cannot be undone.
      </ConfirmDialog>
    </div>
  );
}
