import { Card } from '@/components/ui/card';
import { ErrorBanner } from '@/components/ui/error-banner';
import { PageHeader } from '@/components/ui/page-header';
import { Loading } from '@/components/ui/spinner';
import { useSignedInMe } from '@/features/auth/components/me-context';
import { useStudentClasses } from '@/features/classes/api/get-student-classes';
import { StudentClassList } from '@/features/classes/components/student-class-list';
import { StudentJoinForm } from '@/features/classes/components/student-join-form';
import { LessonPoster } from '@/features/lessons/components/lesson-poster';
import { useStudentHome } from '@/features/student-assignments/api/get-student-home';
import { AssignmentList } from '@/features/student-assignments/components/assignment-list';
import { useSchoolClock } from './use-school-clock';

/** A student's home: the lessons set for them (state, dates in school time, what is new), their classes, and a way to join another. */
export default function StudentHomeRoute() {
  const me = useSignedInMe();
  const classes = useStudentClasses();
  const home = useStudentHome();
  const clock = useSchoolClock();
  return (
    <>
      <PageHeader title={`Hello, ${me.user.name}`} description="Your classes, and the lessons your teachers set you." />
      <div className="grid gap-8 lg:grid-cols-[1fr_22rem]">
        <div className="flex flex-col gap-8">
          <section aria-labelledby="lessons-heading" className="flex flex-col gap-4">
            <h2 id="lessons-heading" className="text-2xl">
              Your lessons
            </h2>
            {home.isPending ? <Loading label="Loading your lessons…" /> : null}
            {home.isError ? <ErrorBanner error={home.error} title="Your lessons could not be loaded" /> : null}
            {home.data ? (
              <AssignmentList
                assignments={home.data.assignments}
                locale={clock.locale}
                now={home.data.serverTime}
                renderPoster={(assignment) => <LessonPoster url={assignment.posterUrl} title={assignment.lessonTitle} className="w-full" />}
              />
            ) : null}
          </section>
          <section aria-labelledby="classes-heading" className="flex flex-col gap-4">
            <h2 id="classes-heading" className="text-2xl">
              Your classes
            </h2>
            {classes.isPending ? <Loading label="Loading your classes…" /> : null}
            {classes.isError ? <ErrorBanner error={classes.error} title="Your classes could not be loaded" /> : null}
            {classes.data ? <StudentClassList classes={classes.data.classes} clock={clock} /> : null}
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
