import { CHECKPOINT_KIND_LABELS, type ResultCheckpointDto, type StudentResultsDto } from '@core/contracts';
import { formatTime } from '@core/lessons/time-format';
import { RichText } from '@/components/rich-text/rich-text';
import { Badge } from '@/components/ui/badge';
import { AlertIcon, CheckIcon, InfoIcon } from '@/components/ui/icons';
import { cn } from '@/lib/cn';
import {
  pointsText,
  pointsWorth,
  revealPendingLine,
  sourceLine,
  unansweredLine,
  VERDICT_WORDS,
  verdictOf,
  type Verdict,
} from '../result-words';

type ResultCheckpointProps = {
  checkpoint: ResultCheckpointDto;
  assignment: StudentResultsDto['assignment'];
  /** The close time in school time, for "after …" lines. */
  closeText: string;
  /** An instant in school time. */
  formatWhen: (iso: string) => string;
};

const VERDICT_LOOK: Record<Verdict, { Icon: typeof CheckIcon; box: string; icon: string }> = {
  right: { Icon: CheckIcon, box: 'border-success bg-success-soft', icon: 'text-success' },
  partly: { Icon: AlertIcon, box: 'border-copper bg-copper-soft', icon: 'text-copper-strong' },
  wrong: { Icon: AlertIcon, box: 'border-danger bg-danger-soft', icon: 'text-danger' },
  saved: { Icon: InfoIcon, box: 'border-teal bg-teal-soft', icon: 'text-teal' },
};

function Attempts({ checkpoint, formatWhen }: Pick<ResultCheckpointProps, 'checkpoint' | 'formatWhen'>) {
  const mono = checkpoint.kind === 'numeric';
  return (
    <div>
      <p className="font-bold">{checkpoint.attempts.length === 1 ? 'Your answer' : 'Your answers'}</p>
      <ol className="flex flex-col gap-1">
        {checkpoint.attempts.map((attempt) => (
          <li key={attempt.attempt} className="flex flex-wrap items-baseline gap-x-2">
            <span className="text-sm text-ink-muted">Attempt {attempt.attempt}:</span>
            <span className={cn('break-words', mono && 'font-mono')}>{attempt.answerText || '(empty)'}</span>
            <span className="text-sm text-ink-muted">
              {formatWhen(attempt.recordedAt)}
              {attempt.late ? ' · marked late' : ''}
              {attempt.sentAfterReconnecting ? ' · sent after reconnecting' : ''}
            </span>
          </li>
        ))}
      </ol>
    </div>
  );
}

function GradeBox({ grade, points }: { grade: NonNullable<ResultCheckpointDto['grade']>; points: number }) {
  const verdict = verdictOf(grade);
  const look = VERDICT_LOOK[verdict];
  const source = sourceLine(grade.source);
  return (
    <div className={cn('flex flex-col gap-2 rounded-md border-l-4 px-4 py-3', look.box)} data-verdict={verdict}>
      <p className="flex flex-wrap items-center gap-2 font-bold">
        <look.Icon className={cn('size-5 shrink-0', look.icon)} />
        {VERDICT_WORDS[verdict]}
        {verdict !== 'saved' && points > 0 ? <span className="font-normal">· {pointsText(grade.score * points, points)}</span> : null}
      </p>
      {grade.feedback.trim() ? <RichText markdown={grade.feedback} /> : null}
      {source ? <p className="text-sm">{source}</p> : null}
    </div>
  );
}

/** One checkpoint of the results: the question, the student's attempts, the mark and the answer as the policies allow. */
export function ResultCheckpoint({ checkpoint, assignment, closeText, formatWhen }: ResultCheckpointProps) {
  const headingId = `result-${checkpoint.key}`;
  const answered = checkpoint.attempts.length > 0;
  const pending = answered && !checkpoint.reveal ? revealPendingLine(assignment, closeText) : null;
  return (
    <li aria-labelledby={headingId} className="flex flex-col gap-3 rounded-lg border border-line bg-surface p-4">
      <div className="flex flex-wrap items-center gap-2">
        <h3 id={headingId} className="text-lg break-words">
          {checkpoint.label}
        </h3>
        {checkpoint.gradeUpdated ? (
          <Badge tone="field">
            <InfoIcon className="size-4" />
            Grade updated
          </Badge>
        ) : null}
      </div>
      <p className="text-sm text-ink-muted">
        {CHECKPOINT_KIND_LABELS[checkpoint.kind]} · at {formatTime(checkpoint.atMs)} in the recording ·{' '}
        {checkpoint.required ? 'required' : 'optional'}
        {checkpoint.points > 0 ? ` · worth ${pointsWorth(checkpoint.points)}` : ''}
      </p>
      <RichText markdown={checkpoint.prompt} />
      {answered ? <Attempts checkpoint={checkpoint} formatWhen={formatWhen} /> : <p>{unansweredLine(assignment, checkpoint)}</p>}
      {answered && checkpoint.grade ? <GradeBox grade={checkpoint.grade} points={checkpoint.points} /> : null}
      {answered && !checkpoint.grade ? <p className="text-sm text-ink-muted">Your answer is saved.</p> : null}
      {checkpoint.reveal ? (
        <div className="flex flex-col gap-2 rounded-md border border-line bg-paper px-3 py-2">
          {checkpoint.reveal.answer.trim() ? (
            <div>
              <p className="font-bold">The answer</p>
              <RichText markdown={checkpoint.reveal.answer} />
            </div>
          ) : null}
          {checkpoint.reveal.explanation.trim() ? (
            <div>
              <p className="font-bold">Why</p>
              <RichText markdown={checkpoint.reveal.explanation} />
            </div>
          ) : null}
        </div>
      ) : null}
      {pending ? <p className="text-sm text-ink-muted">{pending}</p> : null}
    </li>
  );
}
