import { Link } from 'react-router-dom';
import { ErrorBanner } from '@/components/ui/error-banner';
import { PageHeader } from '@/components/ui/page-header';
import { Loading } from '@/components/ui/spinner';
import { paths } from '@/config/paths';
import { useSignedInMe } from '@/features/auth/components/me-context';
import { useTeacherClasses } from '@/features/classes/api/get-teacher-classes';
import { TeacherClassList } from '@/features/classes/components/teacher-class-list';

/** A teacher's home: their classes with join codes, and where their lessons and recordings are. */
export default function TeacherHomeRoute() {
  const me = useSignedInMe();
  const classes = useTeacherClasses();
  return (
    <>
      <PageHeader title={`Welcome, ${me.user.name}`} description="Your classes, and the codes students use to join them." />
      <section aria-labelledby="classes-heading" className="flex flex-col gap-4">
        <h2 id="classes-heading" className="text-2xl">
          Your classes
        </h2>
        {classes.isPending ? <Loading label="Loading your classes…" /> : null}
        {classes.isError ? <ErrorBanner error={classes.error} title="Your classes could not be loaded" /> : null}
        {classes.data ? <TeacherClassList classes={classes.data.classes} classHref={paths.teacher.class} /> : null}
      </section>
      <section aria-labelledby="recordings-heading" className="mt-10 flex flex-col gap-4">
        <h2 id="recordings-heading" className="text-2xl">
          Your recordings
        </h2>
        <p>
          Upload videos of your demonstrations, follow their processing and add captions on the{' '}
          <Link to={paths.teacher.recordings} className="font-bold text-copper underline">
            Recordings page
          </Link>
          .
        </p>
      </section>
      <section aria-labelledby="lessons-heading" className="mt-10 flex flex-col gap-4">
        <h2 id="lessons-heading" className="text-2xl">
          Your lessons
        </h2>
        <p>
          Build lessons from your recordings by pinning checkpoints on the timeline, publish them, and assign a version to your classes from
          the{' '}
          <Link to={paths.lessons.list(paths.teacher.home)} className="font-bold text-copper underline">
            Lessons page
          </Link>
          . Each class above lists the lessons assigned to it.
        </p>
      </section>
    </>
  );
}
