import { Link } from 'react-router-dom';
import { ErrorBanner } from '@/components/ui/error-banner';
import { Loading } from '@/components/ui/spinner';
import { paths } from '@/config/paths';
import { useAssignments } from '@/features/assignments/api/get-assignments';
import { AssignmentTable } from '@/features/assignments/components/assignment-table';

/** The teacher class page's list of the lessons assigned to the class. */
export function ClassAssignmentsSection({ classId, classTitle, locale }: { classId: string; classTitle: string; locale: string }) {
  const list = useAssignments({ classId });
  return (
    <section aria-labelledby="assignments-heading" className="mb-8 flex flex-col gap-3">
      <h2 id="assignments-heading" className="text-2xl">
        Assigned lessons
      </h2>
      {list.isPending ? <Loading label="Loading the class’s assignments…" /> : null}
      {list.isError ? <ErrorBanner error={list.error} title="The class’s assignments could not be loaded" /> : null}
      {list.data ? (
        <AssignmentTable
          assignments={list.data.assignments}
          name="lesson"
          locale={locale}
          caption={`Lessons assigned to ${classTitle}`}
          href={paths.teacher.assignment}
          empty={
            <>
              No lesson is assigned to this class yet. Open a published lesson from{' '}
              <Link to={paths.lessons.list(paths.teacher.home)} className="font-bold text-copper underline">
                Lessons
              </Link>{' '}
              and choose “Assign to classes”.
            </>
          }
        />
      ) : null}
    </section>
  );
}
