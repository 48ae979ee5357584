import type { ReactNode } from 'react';
import { Link } from 'react-router-dom';
import type { StudentAssignmentDto } from '@core/contracts';
import { buttonVariants } from '@/components/ui/button';
import { paths } from '@/config/paths';
import { actionsFor, answeredText, datesLine, stateNote, WATCH_ACTION_LABELS, watchedText, wholePercent } from '../assignment-words';
import type { SchoolTime } from '../school-time';
import { GradeUpdatedBadge, NewBadge, StateBadge } from './state-badge';

type AssignmentCardProps = {
  assignment: StudentAssignmentDto;
  time: SchoolTime;
  /** The recording's poster frame (the route passes the lessons' poster component). */
  poster?: ReactNode;
};

/** One assigned lesson: state, dates in school time, progress, marks for what is new, and where to go next. */
export function AssignmentCard({ assignment, time, poster }: AssignmentCardProps) {
  const headingId = `assignment-${assignment.id}`;
  const actions = actionsFor(assignment, time);
  const note = stateNote(assignment, time);
  const { completion } = assignment;
  const started = assignment.state !== 'upcoming' && assignment.state !== 'not-started';
  return (
    <li
      aria-labelledby={headingId}
      data-state={assignment.state}
      className="flex flex-col gap-4 rounded-lg border border-line bg-surface p-4 sm:flex-row"
    >
      {/* On phones the frame would push the dates and links below the fold. */}
      {poster ? <div className="hidden w-40 shrink-0 sm:block">{poster}</div> : null}
      <div className="flex min-w-0 flex-1 flex-col gap-2">
        <div className="flex flex-wrap items-center gap-2">
          <h4 id={headingId} className="text-lg font-bold break-words">
            {assignment.lessonTitle}
          </h4>
          <StateBadge state={assignment.state} />
          {assignment.isNew ? <NewBadge /> : null}
          {assignment.gradeUpdated ? <GradeUpdatedBadge /> : null}
        </div>
        <p className="text-sm text-ink-muted">
          {assignment.className}
          {assignment.teacherName ? ` · ${assignment.teacherName}` : ''}
        </p>
        <p className="font-bold">{datesLine(assignment, time)}</p>
        {started ? (
          <div className="flex flex-col gap-1">
            <progress
              className="h-2 w-full max-w-xs overflow-hidden rounded-full bg-sunken [&::-moz-progress-bar]:bg-teal [&::-webkit-progress-bar]:bg-sunken [&::-webkit-progress-value]:bg-teal"
              max={100}
              value={wholePercent(completion.watchedShare)}
              aria-label={`Share of ${assignment.lessonTitle} watched`}
            />
            <p className="text-sm">
              {watchedText(completion)} · {answeredText(completion)}
            </p>
          </div>
        ) : null}
        {note ? <p className="text-sm text-ink-muted">{note}</p> : null}
        {assignment.gradeUpdated ? (
          <p className="text-sm">Your teacher corrected this lesson and one of your grades changed. Your results show the new grade.</p>
        ) : null}
      </div>
      {actions.watch || actions.results ? (
        <div className="flex flex-wrap items-start gap-2 sm:w-52 sm:flex-col sm:items-stretch">
          {actions.watch ? (
            <Link
              to={paths.student.watch(assignment.id)}
              className={buttonVariants({ size: 'sm', variant: actions.watch === 'again' ? 'secondary' : 'primary' })}
              aria-label={`${WATCH_ACTION_LABELS[actions.watch]}: ${assignment.lessonTitle}`}
            >
              {WATCH_ACTION_LABELS[actions.watch]}
            </Link>
          ) : null}
          {actions.results ? (
            <Link
              to={paths.student.results(assignment.id)}
              className={buttonVariants({ size: 'sm', variant: actions.watch && actions.watch !== 'again' ? 'secondary' : 'primary' })}
              aria-label={`Your results: ${assignment.lessonTitle}`}
            >
              Your results
            </Link>
          ) : null}
        </div>
      ) : null}
    </li>
  );
}
