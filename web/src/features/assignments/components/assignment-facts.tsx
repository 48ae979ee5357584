import type { ReactNode } from 'react';
import { Link } from 'react-router-dom';
import { FEEDBACK_POLICY_LABELS, REVEAL_POLICY_LABELS, type AssignmentDto } from '@core/contracts';
import { formatDate } from '@/lib/format';
import { FEEDBACK_POLICY_HINTS, REVEAL_POLICY_HINTS, percentText } from '../assignment-labels';
import { schoolDateTime } from '../school-time';

type AssignmentFactsProps = {
  assignment: AssignmentDto;
  locale: string;
  lessonHref: string;
  classHref: string;
};

function Fact({ term, children }: { term: string; children: ReactNode }) {
  return (
    <div className="grid gap-1 sm:grid-cols-[11rem_minmax(0,1fr)] sm:gap-4">
      <dt className="font-bold">{term}</dt>
      <dd className="min-w-0">{children}</dd>
    </div>
  );
}

/** What an assignment is: the lesson version, the class, the dates in school time and what students see when. */
export function AssignmentFacts({ assignment, locale, lessonHref, classHref }: AssignmentFactsProps) {
  const at = (iso: string) => schoolDateTime(iso, assignment.timeZone, locale);
  return (
    <div className="flex flex-col gap-3">
      <dl className="flex flex-col gap-3" aria-label="About this assignment">
        <Fact term="Lesson">
          <Link to={lessonHref} className="font-bold text-copper underline">
            {assignment.lesson.title}
          </Link>{' '}
          · version {assignment.versionNumber}
        </Fact>
        <Fact term="Class">
          <Link to={classHref} className="font-bold text-copper underline">
            {assignment.class.name}
          </Link>
        </Fact>
        <Fact term="Opens">{at(assignment.opensAt)}</Fact>
        <Fact term="Due">{at(assignment.dueAt)}</Fact>
        <Fact term="Late answers">{assignment.lateUntil === null ? 'Not accepted' : `Accepted until ${at(assignment.lateUntil)}`}</Fact>
        <Fact term="Right or wrong">
          <span className="font-bold">{FEEDBACK_POLICY_LABELS[assignment.feedback]}</span>
          <span className="block text-sm text-ink-muted">{FEEDBACK_POLICY_HINTS[assignment.feedback]}</span>
        </Fact>
        <Fact term="Correct answers">
          <span className="font-bold">{REVEAL_POLICY_LABELS[assignment.reveal]}</span>
          <span className="block text-sm text-ink-muted">{REVEAL_POLICY_HINTS[assignment.reveal]}</span>
        </Fact>
        <Fact term="Done when">
          Every required checkpoint is answered and at least {percentText(assignment.completionWatchShare)} of the recording watched
        </Fact>
        <Fact term="Assigned">
          By {assignment.createdBy.name} on {formatDate(assignment.createdAt, { timeZone: assignment.timeZone, locale })}
        </Fact>
      </dl>
      <p className="text-sm text-ink-muted">Times are in the school’s time zone, {assignment.timeZone}.</p>
    </div>
  );
}
