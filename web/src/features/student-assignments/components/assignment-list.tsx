import type { ReactNode } from 'react';
import type { StudentAssignmentDto } from '@core/contracts';
import { Banner } from '@/components/ui/banner';
import { EmptyState } from '@/components/ui/empty-state';
import { FieldLinesIcon } from '@/components/ui/icons';
import { groupAssignments, whatIsNew } from '../assignment-words';
import { AssignmentCard } from './assignment-card';

type AssignmentListProps = {
  assignments: StudentAssignmentDto[];
  /** The school's locale, and the server's clock from the reply. */
  locale: string;
  now: string;
  renderPoster?: (assignment: StudentAssignmentDto) => ReactNode;
};

/** The student's assigned lessons in groups: to do, coming up, finished. */
export function AssignmentList({ assignments, locale, now, renderPoster }: AssignmentListProps) {
  if (assignments.length === 0) {
    return (
      <EmptyState icon={<FieldLinesIcon className="size-8" />} title="No lessons set yet">
        When a teacher assigns a lesson to one of your classes, it appears here with its due date. You will watch the demonstration, and it
        pauses at each checkpoint for your answer.
      </EmptyState>
    );
  }
  const zones = [...new Set(assignments.map((assignment) => assignment.timeZone))].join(', ');
  const news = whatIsNew(assignments);
  return (
    <div className="flex flex-col gap-6">
      {news.length > 0 ? (
        <Banner tone="info" title="What is new">
          <ul className="list-disc pl-5">
            {news.map((line) => (
              <li key={line}>{line}</li>
            ))}
          </ul>
        </Banner>
      ) : null}
      <p className="text-sm text-ink-muted">Times are school time ({zones}).</p>
      {groupAssignments(assignments).map((group) => (
        <section key={group.id} aria-labelledby={`lessons-${group.id}`} className="flex flex-col gap-3">
          <h3 id={`lessons-${group.id}`} className="text-xl">
            {group.title} ({group.assignments.length})
          </h3>
          <ul className="flex flex-col gap-3">
            {group.assignments.map((assignment) => (
              <AssignmentCard
                key={assignment.id}
                assignment={assignment}
                time={{ timeZone: assignment.timeZone, locale, now }}
                poster={renderPoster?.(assignment)}
              />
            ))}
          </ul>
        </section>
      ))}
    </div>
  );
}
