import { Link } from 'react-router-dom';
import type { StudentAssignmentState, WatchViewDto } from '@core/contracts';
import { Badge } from '@/components/ui/badge';
import { AlertIcon, CheckIcon, InfoIcon } from '@/components/ui/icons';
import type { SchoolClock } from '@/lib/format';
import { STATE_WORDS, closesAtOf, feedbackNote, formatSchoolTime, zoneName } from '../logic/watch-text';

type WatchHeaderProps = {
  watch: WatchViewDto;
  /** The state now (the view's, or "done" since a later reply said so). */
  state: StudentAssignmentState;
  clock: SchoolClock;
  resultsHref: string;
};

/** The assignment's facts: lesson, class, due time in school time, state in words and an icon, and the results link. */
export function WatchHeader({ watch, state, clock, resultsHref }: WatchHeaderProps) {
  const { assignment } = watch;
  const Icon = state === 'done' ? CheckIcon : state === 'late' || state === 'closed' ? AlertIcon : InfoIcon;
  const tone = state === 'done' ? 'success' : state === 'late' ? 'copper' : 'neutral';
  const zone = zoneName(assignment.dueAt, clock);
  const note = feedbackNote(watch, clock);
  return (
    <header className="flex flex-col gap-3">
      <div className="flex flex-col gap-2 sm:flex-row sm:items-start sm:justify-between">
        <div className="min-w-0">
          <p className="text-sm font-bold text-ink-muted">{assignment.className}</p>
          <h1 className="text-2xl font-bold break-words">{watch.view.title}</h1>
        </div>
        <Badge tone={tone} className="self-start">
          <Icon className="size-4" />
          {STATE_WORDS[state]}
        </Badge>
      </div>
      <dl className="flex flex-wrap gap-x-6 gap-y-1 text-sm">
        <div className="flex gap-1">
          <dt className="font-bold">Due</dt>
          <dd>
            {formatSchoolTime(assignment.dueAt, clock)} ({zone}, school time)
          </dd>
        </div>
        {assignment.lateUntil ? (
          <div className="flex gap-1">
            <dt className="font-bold">Late answers until</dt>
            <dd>{formatSchoolTime(assignment.lateUntil, clock)}</dd>
          </div>
        ) : null}
      </dl>
      <p className="text-sm">
        <Link to={resultsHref} className="font-bold text-copper underline">
          Your results for this lesson
        </Link>
      </p>
      {state === 'late' ? (
        <p className="text-sm">
          The due time has passed: answers you give now are marked late, and are taken until {formatSchoolTime(closesAtOf(watch), clock)}.
        </p>
      ) : null}
      {note ? <p className="text-sm">{note}</p> : null}
    </header>
  );
}
