import { Link } from 'react-router-dom';
import type { LessonSummaryDto } from '@core/contracts';
import { buttonVariants } from '@/components/ui/button';
import { formatDate, type SchoolClock } from '@/lib/format';
import { checkpointCountText, versionText } from '../lesson-labels';
import { lessonPaths, useSectionBase } from '../section-base';
import { DuplicateLessonButton } from './duplicate-lesson-button';
import { LessonPoster } from './lesson-poster';
import { LessonStateBadge, SharedBadge } from './lesson-state-badge';
import { TagList } from './tag-list';

type LessonListProps = {
  lessons: LessonSummaryDto[];
  clock: SchoolClock;
  /** The caller: their own lessons say "you" and, in the teacher section, open in the studio. */
  meId: string;
  /** Whether the caller keeps a library to copy lessons into (teachers and substitutes). */
  canDuplicate: boolean;
};

/** The lessons as cards: what each is, its state and version, who made it, and what can be done with it. */
export function LessonList({ lessons, clock, meId, canDuplicate }: LessonListProps) {
  return (
    <ul aria-label="Lessons" className="flex flex-col gap-3">
      {lessons.map((lesson) => (
        <LessonCard key={lesson.id} lesson={lesson} clock={clock} meId={meId} canDuplicate={canDuplicate} />
      ))}
    </ul>
  );
}

function LessonCard({ lesson, clock, meId, canDuplicate }: { lesson: LessonSummaryDto } & Omit<LessonListProps, 'lessons'>) {
  const base = useSectionBase();
  const to = lessonPaths(base);
  const mine = lesson.owner?.id === meId;
  const headingId = `lesson-${lesson.id}`;
  return (
    <li aria-labelledby={headingId} className="flex flex-col gap-4 rounded-lg border border-line bg-surface p-4 sm:flex-row">
      <LessonPoster url={lesson.posterUrl} title={lesson.title} className="w-full sm:w-40" />
      <div className="flex min-w-0 flex-1 flex-col gap-2">
        <div className="flex flex-wrap items-center gap-2">
          <h3 id={headingId} className="text-lg break-words">
            <Link to={to.overview(lesson.id)} className="text-ink underline decoration-line-strong underline-offset-2">
              {lesson.title}
            </Link>
          </h3>
          <LessonStateBadge state={lesson.state} />
          {lesson.shared ? <SharedBadge /> : null}
        </div>
        <p className="text-sm text-ink-muted">
          <span className="font-bold text-ink">{versionText(lesson)}</span>
          {' · '}
          {checkpointCountText(lesson.checkpointCount)}
          {lesson.level ? ` · ${lesson.level}` : ''}
        </p>
        <TagList tags={lesson.tags} />
        <p className="text-sm text-ink-muted">
          {mine ? 'Made by you' : `Made by ${lesson.owner?.name ?? 'a former member of staff'}`} · Updated{' '}
          {formatDate(lesson.updatedAt, clock)} · Recording: {lesson.recording.title}
          {lesson.recording.ready ? '' : ' (no longer ready to play)'}
        </p>
      </div>
      <div className="flex flex-wrap items-start gap-2 sm:w-48 sm:flex-col sm:items-stretch">
        <Link
          to={to.overview(lesson.id)}
          className={buttonVariants({ size: 'sm', variant: 'secondary' })}
          aria-label={`Open ${lesson.title}`}
        >
          Open
        </Link>
        {base === '/teacher' && mine ? (
          <Link
            to={lessonPaths('/teacher').studio(lesson.id)}
            className={buttonVariants({ size: 'sm' })}
            aria-label={`Open ${lesson.title} in the studio`}
          >
            Studio
          </Link>
        ) : (
          <Link
            to={to.preview(lesson.id)}
            className={buttonVariants({ size: 'sm', variant: 'secondary' })}
            aria-label={`Preview ${lesson.title} as a student`}
          >
            Preview as student
          </Link>
        )}
        {canDuplicate ? <DuplicateLessonButton lessonId={lesson.id} title={lesson.title} /> : null}
      </div>
    </li>
  );
}
