import { useState } from 'react';
import type { AssignmentDto, AssignmentMovedDto } from '@core/contracts';
import { Banner } from '@/components/ui/banner';
import { Button } from '@/components/ui/button';
import { ConfirmDialog } from '@/components/ui/confirm-dialog';
import { ErrorBanner } from '@/components/ui/error-banner';
import { Loading } from '@/components/ui/spinner';
import { plural } from '@/lib/format';
import { useMoveAssignment } from '../api/move-assignment';

/** What moving onto the newer version would do, worked out in the browser from both versions' content. */
export type MovePreview =
  | { state: 'loading' }
  | { state: 'failed'; error: unknown }
  | {
      state: 'ready';
      /** Why the versions are incompatible (the server would refuse); empty when the move is possible. */
      problems: string[];
      /** One line per answerable checkpoint whose content changed: its answers are regraded. */
      regraded: string[];
    };

type MoveAssignmentProps = {
  assignment: AssignmentDto;
  toVersion: number;
  preview: MovePreview;
  onMoved: (moved: AssignmentMovedDto) => void;
};

/** Offers to move an assignment onto a corrected version of its lesson, saying first what gets regraded. */
export function MoveAssignment({ assignment, toVersion, preview, onMoved }: MoveAssignmentProps) {
  const move = useMoveAssignment(assignment.id);
  const [confirming, setConfirming] = useState(false);
  const ready = preview.state === 'ready' ? preview : null;
  const possible = ready !== null && ready.problems.length === 0;
  return (
    <div className="flex flex-col gap-3">
      <p>
        Version {toVersion} of this lesson is newer than the version {assignment.versionNumber} this class has. Moving keeps every answer
        students gave; answers at checkpoints that changed are graded again from what the students typed.
      </p>
      {preview.state === 'loading' ? <Loading label="Comparing the versions…" /> : null}
      {preview.state === 'failed' ? (
        <ErrorBanner error={preview.error} title="The versions could not be compared here; the server still checks them when you move" />
      ) : null}
      {ready && ready.problems.length > 0 ? (
        <Banner tone="error" title={`This assignment cannot move to version ${toVersion}`}>
          <ul className="mt-1 list-disc pl-5" aria-label="Why it cannot move">
            {ready.problems.map((problem) => (
              <li key={problem}>{problem}</li>
            ))}
          </ul>
          <p className="mt-2">Assign version {toVersion} as a new assignment instead, or publish a version that keeps these questions.</p>
        </Banner>
      ) : null}
      {possible ? (
        ready.regraded.length > 0 ? (
          <div>
            <p className="font-bold">
              {plural(ready.regraded.length, 'checkpoint')} to regrade (students whose grade changes see “Grade updated”):
            </p>
            <ul className="mt-1 list-disc pl-5" aria-label="Checkpoints to regrade">
              {ready.regraded.map((line) => (
                <li key={line}>{line}</li>
              ))}
            </ul>
          </div>
        ) : (
          <p className="font-bold">No question changed between the versions, so no answer is regraded.</p>
        )
      ) : null}
      {preview.state !== 'loading' && (possible || preview.state === 'failed') ? (
        <div>
          <Button variant="secondary" onClick={() => setConfirming(true)}>
            Move to version {toVersion}
          </Button>
        </div>
      ) : null}
      <ConfirmDialog
        open={confirming}
        title={`Move ${assignment.class.name} to version ${toVersion}?`}
        confirmLabel={`Move to version ${toVersion}`}
        cancelLabel="Stay on this version"
        busy={move.isPending}
        error={move.isError ? move.error.message : undefined}
        onConfirm={() =>
          move.mutate(toVersion, {
            onSuccess: (moved) => {
              setConfirming(false);
              onMoved(moved);
            },
          })
        }
        onCancel={() => {
          move.reset();
          setConfirming(false);
        }}
      >
        Students continue on version {toVersion} from now on and their answers are regraded where the checkpoints changed. An assignment
        cannot move back to an older version.
      </ConfirmDialog>
    </div>
  );
}

/** What a move did: how many answers were regraded, how many grades changed and how many students see it. */
export function MovedSummary({ moved, labels }: { moved: AssignmentMovedDto; labels: Record<string, string> }) {
  const names = moved.changedKeys.map((key) => `“${labels[key] ?? key}”`);
  return (
    <Banner tone="success" title={`Moved from version ${moved.fromVersion} to version ${moved.toVersion}`}>
      {moved.changedKeys.length === 0 ? (
        <p>No question changed between the versions, so no answer was regraded.</p>
      ) : (
        <>
          <p>
            Regraded {plural(moved.responsesRegraded, 'answer')} at {plural(moved.changedKeys.length, 'changed checkpoint')}:{' '}
            {names.join(', ')}.
          </p>
          <p>
            {moved.gradesChanged === 0
              ? 'No grade changed.'
              : `${plural(moved.gradesChanged, 'grade')} changed; ${plural(moved.studentsAffected, 'student')} ${moved.studentsAffected === 1 ? 'sees' : 'see'} “Grade updated”.`}
          </p>
        </>
      )}
    </Banner>
  );
}
