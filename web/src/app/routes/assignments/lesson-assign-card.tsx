import { Link } from 'react-router-dom';
import type { LessonDto } from '@core/contracts';
import { buttonVariants } from '@/components/ui/button';
import { Card } from '@/components/ui/card';
import { paths } from '@/config/paths';

/** The lesson overview's way to the assign form (teacher section): a published version can go to the teacher's classes. */
export function LessonAssignCard({ lesson }: { lesson: Pick<LessonDto, 'id' | 'publishedVersion' | 'state'> }) {
  return (
    <Card aria-labelledby="assign-heading">
      <h2 id="assign-heading" className="mb-2 text-xl">
        Assign
      </h2>
      {lesson.state === 'archived' ? (
        <p className="text-ink-muted">Archived lessons are not assigned: restore it from the archive first.</p>
      ) : lesson.publishedVersion === null ? (
        <p className="text-ink-muted">
          Students get a published version, never the draft: publish version 1, then assign it to your classes.
        </p>
      ) : (
        <>
          <p className="mb-3 text-ink-muted">
            Give version {lesson.publishedVersion}
            {lesson.publishedVersion > 1 ? ' (or an earlier one)' : ''} to your classes, with dates in school time and when students see
            right or wrong and the answers.
          </p>
          <Link to={paths.teacher.assignLesson(lesson.id)} className={buttonVariants()}>
            Assign to classes
          </Link>
        </>
      )}
    </Card>
  );
}
