import { useState } from 'react';
import { CHECKPOINT_KIND_LABELS, type CheckpointAnswer, type StudentCheckpoint } from '@core/contracts';
import { formatTime } from '@core/lessons/time-format';
import { Button } from '@/components/ui/button';
import { canTryAgain, hasAnswered, isPending, tryAgainLabel, type AttemptRecord } from '../logic/attempts';
import { CheckpointBody } from './checkpoint-body';

type AsideCardProps = {
  checkpoint: StudentCheckpoint;
  record: AttemptRecord;
  busy: boolean;
  sendError: string | null;
  revealNote: string | null;
  onSubmit: (answer: CheckpointAnswer) => void;
  onDismiss: () => void;
};

/** An aside: shown beside (on phones, below) the video while it keeps playing; the student may close it. */
export function AsideCard({ checkpoint, record, busy, sendError, revealNote, onSubmit, onDismiss }: AsideCardProps) {
  // "Try again" reopens the form until the next grade arrives (a new grade object).
  const [retryOf, setRetryOf] = useState<AttemptRecord['grade']>(null);
  const name = checkpoint.label.trim() || CHECKPOINT_KIND_LABELS[checkpoint.kind];
  const retrying = retryOf !== null && retryOf === record.grade;
  const phase = !isPending(record) && (retrying || !hasAnswered(record) || record.grade?.invalid) ? 'asking' : 'graded';
  return (
    <aside aria-label={`Aside: ${name}`} className="flex flex-col gap-3 rounded-lg border border-line-strong bg-surface p-4">
      <div className="flex items-start justify-between gap-3">
        <div>
          <p className="text-sm text-ink-muted">
            {CHECKPOINT_KIND_LABELS[checkpoint.kind]} · {formatTime(checkpoint.atMs)} · the video keeps playing
          </p>
          <h2 className="font-bold">{name}</h2>
        </div>
        <Button variant="secondary" size="md" onClick={onDismiss} aria-label={`Close the aside “${name}”`}>
          Close
        </Button>
      </div>
      <CheckpointBody checkpoint={checkpoint} record={record} phase={phase} busy={busy} revealNote={revealNote} onSubmit={onSubmit} />
      {sendError ? (
        <p role="alert" className="font-bold text-danger">
          {sendError}
        </p>
      ) : null}
      {phase === 'graded' && canTryAgain(record) ? (
        <div>
          <Button variant="secondary" onClick={() => setRetryOf(record.grade)}>
            {tryAgainLabel(record)}
          </Button>
        </div>
      ) : null}
    </aside>
  );
}
