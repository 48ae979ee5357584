import { Card } from '@/components/ui/card';
import { EmptyState } from '@/components/ui/empty-state';
import { ErrorBanner } from '@/components/ui/error-banner';
import { FieldLinesIcon } from '@/components/ui/icons';
import { PageHeader } from '@/components/ui/page-header';
import { Loading } from '@/components/ui/spinner';
import { useSignedInMe } from '@/features/auth/components/me-context';
import { useStudentClasses } from '@/features/classes/api/get-student-classes';
import { StudentClassList } from '@/features/classes/components/student-class-list';
import { StudentJoinForm } from '@/features/classes/components/student-join-form';
import { useSchoolClock } from './use-school-clock';

/** A student's home: their classes, a way to join another, and where assigned lessons will be. */
export default function StudentHomeRoute() {
  const me = useSignedInMe();
  const classes = useStudentClasses();
  const clock = useSchoolClock();
  return (
    <>
      <PageHeader title={`Hello, ${me.user.name}`} description="Your classes, and the lessons your teachers set you." />
      <div className="grid gap-8 lg:grid-cols-[1fr_22rem]">
        <div className="flex flex-col gap-8">
          <section aria-labelledby="classes-heading" className="flex flex-col gap-4">
            <h2 id="classes-heading" className="text-2xl">
              Your classes
            </h2>
            {classes.isPending ? <Loading label="Loading your classes…" /> : null}
            {classes.isError ? <ErrorBanner error={classes.error} title="Your classes could not be loaded" /> : null}
            {classes.data ? <StudentClassList classes={classes.data.classes} clock={clock} /> : null}
          </section>
          <section aria-labelledby="lessons-heading" className="flex flex-col gap-4">
            <h2 id="lessons-heading" className="text-2xl">
              Your lessons
            </h2>
            <EmptyState icon={<FieldLinesIcon className="size-8" />} title="No lessons set yet">
              When a teacher assigns a lesson to one of your classes, it appears here with its due date. You will watch the demonstration,
              and it pauses at each checkpoint for your answer.
            </EmptyState>
          </section>
        </div>
        <Card aria-labelledby="join-heading" className="flex h-fit flex-col gap-3">
          <h2 id="join-heading" className="text-xl">
            Join a class
          </h2>
          <StudentJoinForm />
        </Card>
      </div>
    </>
  );
}
