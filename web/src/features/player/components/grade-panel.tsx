import type { CheckpointGradeDto } from '@core/contracts';
import { RichText } from '@/components/rich-text/rich-text';
import { AlertIcon, CheckIcon, InfoIcon } from '@/components/ui/icons';
import { cn } from '@/lib/cn';

type GradePanelProps = {
  grade: CheckpointGradeDto;
  /** A prediction keeps its reveal for the reveal time; every other kind shows it when the server sends it. */
  showReveal: boolean;
  /** A prediction at its pin: whether it matched is told at the reveal, so the verdict reads "Saved". */
  verdictLater?: boolean;
  /** The feedback policy hides right/wrong: a neutral "saved", and how many changes remain. */
  feedbackHidden?: boolean;
  /** Why no answer is shown once nothing more can be submitted (the reveal policy), or null. */
  revealNote?: string | null;
};

const VERDICTS = {
  right: { Icon: CheckIcon, words: 'Right', tone: 'border-success bg-success-soft', icon: 'text-success' },
  wrong: { Icon: AlertIcon, words: 'Not right yet', tone: 'border-danger bg-danger-soft', icon: 'text-danger' },
  saved: { Icon: InfoIcon, words: 'Saved', tone: 'border-teal bg-teal-soft', icon: 'text-teal' },
  hidden: { Icon: InfoIcon, words: 'Answer saved', tone: 'border-teal bg-teal-soft', icon: 'text-teal' },
} as const;

function attemptsText(left: number): string {
  if (left <= 0) return 'No attempts left.';
  return left === 1 ? '1 attempt left.' : `${left} attempts left.`;
}

function changesText(left: number): string {
  if (left <= 0) return 'This is your final answer here.';
  const times = left === 1 ? 'once more' : `${left} more times`;
  return `You can change it ${times}; your latest answer is the one that counts.`;
}

/** What the server's grade said, in words and an icon (never colour alone). */
export function GradePanel({ grade, showReveal, verdictLater = false, feedbackHidden = false, revealNote = null }: GradePanelProps) {
  const shown = verdictLater || feedbackHidden ? null : grade.correct;
  const verdict = VERDICTS[feedbackHidden ? 'hidden' : shown === true ? 'right' : shown === false ? 'wrong' : 'saved'];
  const { Icon } = verdict;
  return (
    <section
      aria-label="Result"
      className={cn('flex flex-col gap-3 rounded-md border-l-4 px-4 py-3', verdict.tone)}
      data-verdict={feedbackHidden ? 'hidden' : shown === null ? 'saved' : String(shown)}
    >
      <p className="flex items-center gap-2 text-lg font-bold" role="status">
        <Icon className={cn('size-6 shrink-0', verdict.icon)} />
        {verdict.words}
      </p>
      {grade.feedback.trim() ? <RichText markdown={grade.feedback} /> : null}
      {grade.hints.length > 0 ? (
        <div>
          <p className="font-bold">{grade.hints.length === 1 ? 'Hint' : 'Hints'}</p>
          <ol className="list-decimal pl-6">
            {grade.hints.map((hint, index) => (
              <li key={index}>
                <RichText markdown={hint} />
              </li>
            ))}
          </ol>
        </div>
      ) : null}
      {shown === false ? <p className="text-sm">{attemptsText(grade.attemptsLeft)}</p> : null}
      {feedbackHidden && !verdictLater ? <p className="text-sm">{changesText(grade.attemptsLeft)}</p> : null}
      {showReveal && grade.reveal ? <RevealText answer={grade.reveal.answer} explanation={grade.reveal.explanation} /> : null}
      {showReveal && !grade.reveal && revealNote && (grade.correct === true || grade.attemptsLeft <= 0) ? (
        <p className="text-sm">{revealNote}</p>
      ) : null}
    </section>
  );
}

type RevealTextProps = {
  answer: string;
  explanation: string;
  /** What the explanation is called: "Why" after a question; a prediction's reveal says what happened instead. */
  explanationLabel?: string;
};

export function RevealText({ answer, explanation, explanationLabel = 'Why' }: RevealTextProps) {
  return (
    <div className="flex flex-col gap-2 rounded-md border border-line bg-surface px-3 py-2">
      {answer.trim() ? (
        <div>
          <p className="font-bold">The answer</p>
          <RichText markdown={answer} />
        </div>
      ) : null}
      {explanation.trim() ? (
        <div>
          <p className="font-bold">{explanationLabel}</p>
          <RichText markdown={explanation} />
        </div>
      ) : null}
    </div>
  );
}
