import type { ReactNode } from 'react';
import { CHECKPOINT_KIND_LABELS, type Checkpoint, type LessonProblem } from '@core/contracts';
import { checkpointLabel } from '@core/lessons/checkpoint-label';
import { Button } from '@/components/ui/button';
import { CopyIcon, CloseIcon } from '@/components/ui/icons';
import { messageAt } from '../draft/problems';
import { KindIcon } from '../timeline/kind-icons';
import { TimeField } from './time-field';

export type CheckpointFormSlotProps = {
  checkpoint: Checkpoint;
  onChange: (next: Checkpoint) => void;
  problems: LessonProblem[];
  lessonId: string;
  durationMs: number;
};

type CheckpointPanelProps = {
  checkpoint: Checkpoint;
  problems: LessonProblem[];
  lessonId: string;
  durationMs: number;
  renderForm: (props: CheckpointFormSlotProps) => ReactNode;
  onChange: (next: Checkpoint) => void;
  /** Moves it; returns why not (too close to another, past the end), or null. */
  onMoveTo: (atMs: number) => string | null;
  onDelete: () => void;
  onDuplicate: () => void;
  onClose: () => void;
};

/** The selected checkpoint: its kind, time, the kind's own form, and delete / duplicate. */
export function CheckpointPanel(props: CheckpointPanelProps) {
  const { checkpoint, problems } = props;
  const whole = problems.filter((p) => p.path === '');
  return (
    <section aria-labelledby="checkpoint-panel-title" className="flex flex-col gap-4">
      <div className="flex items-start justify-between gap-2">
        <div className="min-w-0">
          <p className="flex items-center gap-2 text-sm font-bold text-ink-muted">
            <KindIcon kind={checkpoint.kind} className="size-5" />
            {CHECKPOINT_KIND_LABELS[checkpoint.kind]}
          </p>
          <h2 id="checkpoint-panel-title" className="truncate text-xl">
            {checkpointLabel(checkpoint)}
          </h2>
        </div>
        <Button size="sm" variant="ghost" onClick={props.onClose} aria-label="Close the checkpoint and show the lesson settings">
          <CloseIcon className="size-5" />
        </Button>
      </div>
      <div className="flex flex-wrap items-end gap-3">
        <TimeField
          label="Time"
          hint="m:ss.mmm, moved to the nearest frame"
          valueMs={checkpoint.atMs}
          onCommit={props.onMoveTo}
          problem={messageAt(problems, 'atMs')}
        />
        <div className="flex gap-2 pb-0.5">
          <Button size="sm" variant="secondary" onClick={props.onDuplicate}>
            <CopyIcon className="size-4" />
            Duplicate
          </Button>
          <Button size="sm" variant="danger" onClick={props.onDelete}>
            Delete
          </Button>
        </div>
      </div>
      {whole.length > 0 ? (
        <ul className="list-disc pl-5 text-sm font-bold text-danger">
          {whole.map((p) => (
            <li key={p.message}>{p.message}</li>
          ))}
        </ul>
      ) : null}
      {props.renderForm({
        checkpoint,
        onChange: props.onChange,
        problems,
        lessonId: props.lessonId,
        durationMs: props.durationMs,
      })}
    </section>
  );
}
