import { useCallback, useState } from 'react';
import { Link, useNavigate, useSearchParams } from 'react-router-dom';
import type { LessonListQuery } from '@core/contracts';
import { Button, buttonVariants } from '@/components/ui/button';
import { Card } from '@/components/ui/card';
import { EmptyState } from '@/components/ui/empty-state';
import { ErrorBanner } from '@/components/ui/error-banner';
import { FieldLinesIcon, PlusIcon, UploadIcon } from '@/components/ui/icons';
import { PageHeader } from '@/components/ui/page-header';
import { Loading } from '@/components/ui/spinner';
import { activeMembership } from '@/features/auth/api/get-me';
import { useSignedInMe } from '@/features/auth/components/me-context';
import { useLessons } from '@/features/lessons/api/get-lessons';
import { useReadyRecordings } from '@/features/lessons/api/get-ready-recordings';
import { ImportLessonForm } from '@/features/lessons/components/import-lesson-form';
import { LessonFilterBar } from '@/features/lessons/components/lesson-filter-bar';
import { LessonList } from '@/features/lessons/components/lesson-list';
import { isFiltered, readLessonFilters, writeLessonFilters } from '@/features/lessons/lesson-filters';
import { lessonPaths, useSectionBase } from '@/features/lessons/section-base';
import { paths } from '@/config/paths';
import { plural } from '@/lib/format';
import { useSchoolClock } from '../homes/use-school-clock';

/** The lessons the caller can see: their own (teachers) and those shared with their department or with substitutes. */
export default function LessonsRoute() {
  const me = useSignedInMe();
  const clock = useSchoolClock();
  const base = useSectionBase();
  const teacher = base === '/teacher';
  const roles = activeMembership(me)?.roles ?? [];
  const canDuplicate = roles.includes('teacher') || roles.includes('substitute');
  const [importing, setImporting] = useState(false);
  const [params, setParams] = useSearchParams();
  const filters = readLessonFilters(params);
  const lessons = useLessons(filters);
  const list = lessons.data?.lessons;
  const filtered = isFiltered(filters);

  const changeFilters = useCallback(
    (update: (current: LessonListQuery) => LessonListQuery, options: { replace: boolean }) =>
      setParams((current) => writeLessonFilters(update(readLessonFilters(current))), options),
    [setParams],
  );

  return (
    <>
      <PageHeader
        title="Lessons"
        description={
          teacher
            ? 'Lessons are recordings with checkpoints pinned on them. Build one in the studio, preview it as a student, then publish it.'
            : 'Lessons colleagues shared with you, read-only. Preview one as a student, or duplicate it into your own library.'
        }
        actions={
          teacher ? (
            <>
              <Link to={lessonPaths('/teacher').create()} className={buttonVariants()}>
                <PlusIcon className="size-5" />
                New lesson
              </Link>
              <Button
                variant="secondary"
                aria-expanded={importing}
                aria-controls="import-lesson"
                onClick={() => setImporting((open) => !open)}
              >
                <UploadIcon className="size-5" />
                Import lesson file
              </Button>
            </>
          ) : null
        }
      />
      {teacher && importing ? <ImportPanel onClose={() => setImporting(false)} /> : null}
      <LessonFilterBar filters={filters} choices={lessons.data} meId={me.user.id} onChange={changeFilters} />
      {lessons.isPending ? <Loading label="Loading lessons…" /> : null}
      {lessons.isError ? <ErrorBanner error={lessons.error} title="The lessons could not be loaded" /> : null}
      {list && list.length === 0 && !filtered ? (
        teacher ? (
          <EmptyState icon={<FieldLinesIcon className="size-8" />} title="No lessons yet">
            Choose <strong>New lesson</strong> and pick a ready recording, or open a recording on the{' '}
            <Link to={paths.teacher.recordings} className="font-bold text-copper underline">
              Recordings page
            </Link>{' '}
            and choose <strong>Make a lesson</strong>. A lesson file from a colleague can be imported too.
          </EmptyState>
        ) : (
          <EmptyState icon={<FieldLinesIcon className="size-8" />} title="No lessons are shared with you yet">
            When a teacher shares a lesson with the department, it appears here. Ask the class’s teacher to share the lesson you need.
          </EmptyState>
        )
      ) : null}
      {list && (list.length > 0 || filtered) ? (
        <>
          <p className="mb-2 text-ink-muted">
            {plural(list.length, 'lesson')}
            {lessons.isFetching && lessons.isPlaceholderData ? ' · updating…' : ''}
          </p>
          {list.length === 0 ? (
            <EmptyState title="No lesson matches these filters">
              Try another search or tag, or{' '}
              <button
                type="button"
                className="cursor-pointer font-bold text-copper underline"
                onClick={() => setParams(new URLSearchParams())}
              >
                clear the filters
              </button>
              .
            </EmptyState>
          ) : (
            <LessonList lessons={list} clock={clock} meId={me.user.id} canDuplicate={canDuplicate} />
          )}
        </>
      ) : null}
    </>
  );
}

/** Import a lesson file onto one of the school's ready recordings; the new draft opens in the studio. */
function ImportPanel({ onClose }: { onClose: () => void }) {
  const navigate = useNavigate();
  const recordings = useReadyRecordings();
  return (
    <Card id="import-lesson" aria-labelledby="import-heading" className="mb-8">
      <div className="mb-3 flex flex-wrap items-center justify-between gap-2">
        <h2 id="import-heading" className="text-xl">
          Import a lesson file
        </h2>
        <Button size="sm" variant="ghost" onClick={onClose}>
          Close
        </Button>
      </div>
      {recordings.isPending ? <Loading label="Loading ready recordings…" /> : null}
      {recordings.isError ? <ErrorBanner error={recordings.error} title="The recordings could not be loaded" /> : null}
      {recordings.data && recordings.data.length === 0 ? (
        <p>
          A lesson file goes on a ready recording, and the school has none yet.{' '}
          <Link to={paths.teacher.recordings} className="font-bold text-copper underline">
            Upload one
          </Link>{' '}
          first.
        </p>
      ) : null}
      {recordings.data && recordings.data.length > 0 ? (
        <ImportLessonForm recordings={recordings.data} onImported={(lesson) => void navigate(lessonPaths('/teacher').studio(lesson.id))} />
      ) : null}
    </Card>
  );
}
