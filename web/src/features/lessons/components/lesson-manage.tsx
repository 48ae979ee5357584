import { useId, useState } from 'react';
import type { LessonDto } from '@core/contracts';
import { Button } from '@/components/ui/button';
import { FieldError } from '@/components/ui/field';
import { LiveRegion } from '@/components/ui/live-region';
import { ConfirmDialog } from '@/components/ui/confirm-dialog';
import { useDeleteLesson } from '../api/delete-lesson';
import { useUpdateLesson } from '../api/update-lesson';

type LessonManageProps = { lesson: LessonDto; onDeleted: () => void };

/** Sharing with the department, archiving and, for a lesson never published, deleting: for its editors only. */
export function LessonManage({ lesson, onDeleted }: LessonManageProps) {
  const shareId = useId();
  const share = useUpdateLesson(lesson.id);
  const archive = useUpdateLesson(lesson.id);
  const remove = useDeleteLesson();
  const [confirming, setConfirming] = useState(false);
  const archived = lesson.state === 'archived';
  return (
    <div className="flex flex-col gap-5">
      <div className="flex flex-col gap-1">
        <label htmlFor={shareId} className="flex items-start gap-3">
          <input
            id={shareId}
            type="checkbox"
            checked={lesson.shared}
            disabled={share.isPending}
            aria-describedby={`${shareId}-hint`}
            onChange={(event) => share.mutate({ shared: event.target.checked })}
            className="mt-1 size-5 shrink-0 accent-teal"
          />
          <span className="font-bold">Share with the department (read-only)</span>
        </label>
        <p id={`${shareId}-hint`} className="pl-8 text-sm text-ink-muted">
          Colleagues in the department and substitute teachers can open it, preview it and duplicate it; only you can change it.
        </p>
        <LiveRegion className="pl-8 text-sm">
          {share.isSuccess ? (lesson.shared ? 'Shared with the department.' : 'No longer shared.') : null}
        </LiveRegion>
        <FieldError message={share.isError ? `Sharing was not changed: ${share.error.message}` : undefined} />
      </div>

      <div className="flex flex-col items-start gap-1">
        <Button variant="secondary" busy={archive.isPending} onClick={() => archive.mutate({ archived: !archived })}>
          {archived ? 'Restore from the archive' : 'Archive'}
        </Button>
        <p className="text-sm text-ink-muted">
          {archived
            ? 'Archived lessons stay with their versions and results but are left out of the lists.'
            : 'Archiving keeps the lesson, its versions and its results, and leaves it out of the lists until restored.'}
        </p>
        <FieldError message={archive.isError ? archive.error.message : undefined} />
      </div>

      {lesson.publishedVersion === null ? (
        <div className="flex flex-col items-start gap-1">
          <Button variant="danger" onClick={() => setConfirming(true)}>
            Delete the lesson
          </Button>
          <p className="text-sm text-ink-muted">Possible while it has never been published; a published lesson is archived instead.</p>
          <ConfirmDialog
            open={confirming}
            title={`Delete “${lesson.title}”?`}
            confirmLabel="Delete the lesson"
            cancelLabel="Keep it"
            busy={remove.isPending}
            error={remove.isError ? remove.error.message : undefined}
            onConfirm={() =>
              remove.mutate(lesson.id, {
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
            The draft with its checkpoints and chapters is deleted. The recording stays. This cannot be undone.
          </ConfirmDialog>
        </div>
      ) : null}
    </div>
  );
}
