import { useState } from 'react';
import { Link, useParams } from 'react-router-dom';
import type { AssignmentCreatedDto } from '@core/contracts';
import { BackLink } from '@/components/ui/back-link';
import { buttonVariants } from '@/components/ui/button';
import { Card } from '@/components/ui/card';
import { EmptyState } from '@/components/ui/empty-state';
import { ErrorBanner } from '@/components/ui/error-banner';
import { PeopleIcon } from '@/components/ui/icons';
import { PageHeader } from '@/components/ui/page-header';
import { Loading } from '@/components/ui/spinner';
import { paths } from '@/config/paths';
import { useAssignments } from '@/features/assignments/api/get-assignments';
import { AssignForm } from '@/features/assignments/components/assign-form';
import { AssignedSummary } from '@/features/assignments/components/assigned-summary';
import { AssignmentTable } from '@/features/assignments/components/assignment-table';
import { useTeacherClasses } from '@/features/classes/api/get-teacher-classes';
import { useLesson } from '@/features/lessons/api/get-lesson';
import { useVersions } from '@/features/lessons/api/get-versions';
import { useSchoolClock } from '../homes/use-school-clock';

/** Assigns a published lesson to the teacher's classes; below the form, the classes that already have it. */
export default function AssignLessonRoute() {
  const { lessonId = '' } = useParams();
  const clock = useSchoolClock();
  const lesson = useLesson(lessonId);
  const versions = useVersions(lessonId);
  const classes = useTeacherClasses();
  const existing = useAssignments({ lessonId });
  const [created, setCreated] = useState<AssignmentCreatedDto | null>(null);
  const overview = paths.lessons.overview(paths.teacher.home, lessonId);
  const pending = lesson.isPending || versions.isPending || classes.isPending;
  const failure = lesson.error ?? versions.error ?? classes.error;
  const published = versions.data?.versions ?? [];

  return (
    <>
      <BackLink to={overview}>The lesson</BackLink>
      <PageHeader
        title={lesson.data ? `Assign “${lesson.data.title}”` : 'Assign a lesson'}
        description="Choose the version and classes, when it opens and is due, and when students see right or wrong and the answers."
      />
      {pending ? <Loading label="Loading the lesson and your classes…" /> : null}
      {failure ? <ErrorBanner error={failure} title="The assign form could not be loaded" /> : null}
      {!pending && !failure ? (
        created ? (
          <div className="flex max-w-3xl flex-col gap-4">
            <AssignedSummary created={created} locale={clock.locale} href={paths.teacher.assignment} />
            <p className="flex flex-wrap gap-2">
              <Link to={overview} className={buttonVariants({ variant: 'secondary' })}>
                Back to the lesson
              </Link>
            </p>
          </div>
        ) : published.length === 0 ? (
          <EmptyState title="Nothing to assign yet">
            Students get a published version, never the draft. Publish a version on the lesson’s page, then assign it here.
          </EmptyState>
        ) : (classes.data?.classes.length ?? 0) === 0 ? (
          <EmptyState icon={<PeopleIcon className="size-8" />} title="You have no classes yet">
            Your school admin creates classes and names you as their teacher; then you can assign lessons to them here.
          </EmptyState>
        ) : (
          <Card className="max-w-3xl">
            <AssignForm
              lessonId={lessonId}
              versions={published}
              classes={classes.data?.classes ?? []}
              clock={clock}
              onCreated={setCreated}
            />
          </Card>
        )
      ) : null}
      <section aria-labelledby="assigned-heading" className="mt-10 flex flex-col gap-4">
        <h2 id="assigned-heading" className="text-2xl">
          Already assigned
        </h2>
        {existing.isPending ? <Loading label="Loading the assignments of this lesson…" /> : null}
        {existing.isError ? <ErrorBanner error={existing.error} title="The assignments of this lesson could not be loaded" /> : null}
        {existing.data ? (
          <AssignmentTable
            assignments={existing.data.assignments}
            name="class"
            locale={clock.locale}
            caption="Classes this lesson is assigned to"
            href={paths.teacher.assignment}
            empty="No class has this lesson yet."
          />
        ) : null}
      </section>
    </>
  );
}
