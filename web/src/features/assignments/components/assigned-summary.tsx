import { Link } from 'react-router-dom';
import type { AssignmentCreatedDto } from '@core/contracts';
import { Banner } from '@/components/ui/banner';
import { plural } from '@/lib/format';
import { schoolDateTime } from '../school-time';

/** What the assign form just made: one assignment per class, each linked to its page. */
export function AssignedSummary({
  created,
  locale,
  href,
}: {
  created: AssignmentCreatedDto;
  locale: string;
  href: (assignmentId: string) => string;
}) {
  const first = created.assignments[0];
  return (
    <Banner tone="success" title={`Assigned to ${plural(created.assignments.length, 'class', 'classes')}`}>
      {first ? (
        <p>
          Version {first.versionNumber} of “{first.lesson.title}”, due {schoolDateTime(first.dueAt, first.timeZone, locale)}.
        </p>
      ) : null}
      <ul className="mt-2 flex flex-col gap-1" aria-label="New assignments">
        {created.assignments.map((assignment) => (
          <li key={assignment.id}>
            <Link to={href(assignment.id)} className="font-bold text-copper underline">
              {assignment.class.name}
            </Link>{' '}
            <span className="text-ink-muted">({plural(assignment.counts.students, 'student')})</span>
          </li>
        ))}
      </ul>
    </Banner>
  );
}
