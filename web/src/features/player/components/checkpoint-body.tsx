import type { CheckpointAnswer, StudentCheckpoint } from '@core/contracts';
import { RichText } from '@/components/rich-text/rich-text';
import { isPending, type AttemptRecord } from '../logic/attempts';
import { MultipleChoiceAnswer } from './answers/multiple-choice-answer';
import { NumericAnswer } from './answers/numeric-answer';
import { PredictionAnswer } from './answers/prediction-answer';
import { ShortTextAnswer } from './answers/short-text-answer';
import { SignAnswer } from './answers/sign-answer';
import { EquationView } from './equation-view';
import { GradePanel } from './grade-panel';
import { NoteView } from './note-view';
import { usePlayerLocale } from '../player-locale';
import { PendingPanel } from './pending-panel';

export type CheckpointBodyProps = {
  checkpoint: StudentCheckpoint;
  record: AttemptRecord;
  phase: 'asking' | 'graded';
  busy: boolean;
  /** Why answers are not shown yet (the reveal policy), or null. */
  revealNote?: string | null;
  onSubmit: (answer: CheckpointAnswer) => void;
};

function AnswerForm({
  checkpoint,
  locked,
  busy,
  problem,
  onSubmit,
}: {
  checkpoint: StudentCheckpoint;
  locked: boolean;
  busy: boolean;
  problem: string | null;
  onSubmit: (answer: CheckpointAnswer) => void;
}) {
  const common = { locked, busy, problem, onSubmit };
  const locale = usePlayerLocale();
  switch (checkpoint.kind) {
    case 'multiple-choice':
      return <MultipleChoiceAnswer checkpoint={checkpoint} {...common} />;
    case 'numeric':
      return <NumericAnswer checkpoint={checkpoint} locale={locale} {...common} />;
    case 'short-text':
      return <ShortTextAnswer checkpoint={checkpoint} {...common} />;
    case 'sign':
      return <SignAnswer checkpoint={checkpoint} {...common} />;
    case 'prediction':
      return <PredictionAnswer checkpoint={checkpoint} {...common} />;
    default:
      return null;
  }
}

/** One checkpoint's content at its pin: the prompt and answer form, or the card or note, and the last grade. */
export function CheckpointBody({ checkpoint, record, phase, busy, revealNote = null, onSubmit }: CheckpointBodyProps) {
  if (checkpoint.kind === 'note') return <NoteView checkpoint={checkpoint} />;
  if (checkpoint.kind === 'equation') return <EquationView checkpoint={checkpoint} />;
  const grade = record.grade;
  const problem = phase === 'asking' && grade?.invalid ? grade.feedback : null;
  return (
    <div className="flex flex-col gap-4">
      <RichText markdown={checkpoint.prompt} className="text-lg" />
      <AnswerForm checkpoint={checkpoint} locked={phase === 'graded'} busy={busy} problem={problem} onSubmit={onSubmit} />
      {phase === 'graded' && isPending(record) ? <PendingPanel /> : null}
      {phase === 'graded' && !isPending(record) && grade && !grade.invalid ? (
        <GradePanel
          grade={grade}
          showReveal={checkpoint.kind !== 'prediction'}
          verdictLater={checkpoint.kind === 'prediction'}
          feedbackHidden={record.feedbackHidden === true}
          revealNote={checkpoint.kind === 'prediction' ? null : revealNote}
        />
      ) : null}
    </div>
  );
}
