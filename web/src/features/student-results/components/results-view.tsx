import type { StudentResultsDto } from '@core/contracts';
import { Card } from '@/components/ui/card';
import { EmptyState } from '@/components/ui/empty-state';
import { InfoIcon } from '@/components/ui/icons';
import { feedbackNote, pointsText, revealNote } from '../result-words';
import { ResultCheckpoint } from './result-checkpoint';

type ResultsViewProps = {
  results: StudentResultsDto;
  /** An instant in school time ('Thu 3 Dec, 17:00'). */
  formatWhen: (iso: string) => string;
};

/** The student's score (when feedback shows), what the policies still hold back, and every answerable checkpoint. */
export function ResultsView({ results, formatWhen }: ResultsViewProps) {
  const { assignment } = results;
  const closeText = formatWhen(assignment.lateUntil ?? assignment.dueAt);
  const notes = [feedbackNote(assignment, closeText), revealNote(assignment, closeText)].filter((note) => note !== null);
  const checkpoints = [...results.checkpoints].sort((a, b) => a.atMs - b.atMs);
  return (
    <div className="flex flex-col gap-6">
      <Card aria-labelledby="score-heading" className="flex flex-col gap-2">
        <h2 id="score-heading" className="text-xl">
          Your score
        </h2>
        {results.score ? (
          <p className="text-lg font-bold">{pointsText(results.score.earned, results.score.possible)}</p>
        ) : (
          <p>{assignment.feedback === 'never' ? 'Not shown for this lesson.' : 'Not shown yet.'}</p>
        )}
        {notes.length > 0 ? (
          <ul className="flex flex-col gap-1">
            {notes.map((note) => (
              <li key={note} className="flex items-start gap-2 text-ink-muted">
                <InfoIcon className="mt-1 size-4 shrink-0 text-teal" />
                {note}
              </li>
            ))}
          </ul>
        ) : null}
      </Card>
      <section aria-labelledby="answers-heading" className="flex flex-col gap-3">
        <h2 id="answers-heading" className="text-2xl">
          Question by question
        </h2>
        {checkpoints.length === 0 ? (
          <EmptyState title="No questions in this lesson">
            This lesson has equation cards and notes only: there is nothing to answer.
          </EmptyState>
        ) : (
          <ol className="flex flex-col gap-3">
            {checkpoints.map((checkpoint) => (
              <ResultCheckpoint
                key={checkpoint.key}
                checkpoint={checkpoint}
                assignment={assignment}
                closeText={closeText}
                formatWhen={formatWhen}
              />
            ))}
          </ol>
        )}
      </section>
    </div>
  );
}
