import { Link, useNavigate, useParams } from 'react-router-dom';
import type { LessonDto } from '@core/contracts';
import { BackLink } from '@/components/ui/back-link';
import { buttonVariants } from '@/components/ui/button';
import { Card } from '@/components/ui/card';
import { ErrorBanner } from '@/components/ui/error-banner';
import { Loading } from '@/components/ui/spinner';
import { activeMembership } from '@/features/auth/api/get-me';
import { useSignedInMe } from '@/features/auth/components/me-context';
import { useLesson } from '@/features/lessons/api/get-lesson';
import { useVersions } from '@/features/lessons/api/get-versions';
import { lessonDownloads } from '@/features/lessons/api/lesson-downloads';
import { DuplicateLessonButton } from '@/features/lessons/components/duplicate-lesson-button';
import { LessonManage } from '@/features/lessons/components/lesson-manage';
import { LessonStateBadge, SharedBadge } from '@/features/lessons/components/lesson-state-badge';
import { LessonSummary } from '@/features/lessons/components/lesson-summary';
import { PublishForm } from '@/features/lessons/components/publish-form';
import { VersionList } from '@/features/lessons/components/version-list';
import { versionText } from '@/features/lessons/lesson-labels';
import { lessonPaths, useSectionBase } from '@/features/lessons/section-base';
import { formatDateTime, type SchoolClock } from '@/lib/format';
import { LessonAssignCard } from '../assignments/lesson-assign-card';
import { useSchoolClock } from '../homes/use-school-clock';

/** One lesson: what it is, its versions and files; its owner also publishes, shares, archives or deletes it here. */
export default function LessonOverviewRoute() {
  const { lessonId = '' } = useParams();
  const base = useSectionBase();
  const navigate = useNavigate();
  const clock = useSchoolClock();
  const me = useSignedInMe();
  const roles = activeMembership(me)?.roles ?? [];
  const canDuplicate = roles.includes('teacher') || roles.includes('substitute');
  const detail = useLesson(lessonId);
  const lesson = detail.data;
  const to = lessonPaths(base);
  return (
    <>
      <BackLink to={to.list}>Lessons</BackLink>
      {detail.isPending ? <Loading label="Loading the lesson…" /> : null}
      {detail.isError && !lesson ? <ErrorBanner error={detail.error} title="This lesson could not be loaded" /> : null}
      {lesson ? (
        <>
          <LessonHeader lesson={lesson} clock={clock} meId={me.user.id} />
          <div className="mb-8 flex flex-wrap gap-2">
            {lesson.canEdit ? (
              <Link to={to.studio(lesson.id)} className={buttonVariants()}>
                Open studio
              </Link>
            ) : null}
            <Link to={to.preview(lesson.id)} className={buttonVariants({ variant: lesson.canEdit ? 'secondary' : 'primary' })}>
              Preview as student
            </Link>
            {canDuplicate ? <DuplicateLessonButton lessonId={lesson.id} title={lesson.title} size="md" /> : null}
            <a href={lessonDownloads.file(lesson.id)} className={buttonVariants({ variant: 'secondary' })} download>
              Export lesson file
            </a>
          </div>
          <div className="grid gap-6 lg:grid-cols-[minmax(0,3fr)_minmax(0,2fr)]">
            <LessonSummary lesson={lesson} />
            <div className="flex flex-col gap-6">
              {base === '/teacher' ? <LessonAssignCard lesson={lesson} /> : null}
              {lesson.canEdit ? (
                <>
                  <Card aria-labelledby="publish-heading">
                    <h2 id="publish-heading" className="mb-3 text-xl">
                      Publish
                    </h2>
                    <PublishForm lesson={lesson} />
                  </Card>
                  <Card aria-labelledby="manage-heading">
                    <h2 id="manage-heading" className="mb-3 text-xl">
                      Sharing and archive
                    </h2>
                    <LessonManage lesson={lesson} onDeleted={() => void navigate(to.list)} />
                  </Card>
                </>
              ) : (
                <Card aria-labelledby="readonly-heading">
                  <h2 id="readonly-heading" className="mb-2 text-xl">
                    Read-only
                  </h2>
                  <p className="text-ink-muted">
                    {lesson.owner ? `${lesson.owner.name} shared this lesson.` : 'This lesson was shared with you.'} Preview it as a
                    student, or duplicate it to change a copy of your own.
                  </p>
                </Card>
              )}
              <Card aria-labelledby="tracks-heading">
                <h2 id="tracks-heading" className="mb-2 text-xl">
                  WebVTT tracks
                </h2>
                <p className="mb-2 text-sm text-ink-muted">
                  {lesson.canEdit
                    ? 'The chapters and checkpoint times of the draft'
                    : 'The chapters and checkpoint times of the newest published version'}
                  , for other players and editors.
                </p>
                <p className="flex flex-wrap gap-x-4">
                  <a href={lessonDownloads.chapters(lesson.id)} className="font-bold text-copper underline" download>
                    Chapters track
                  </a>
                  <a href={lessonDownloads.checkpoints(lesson.id)} className="font-bold text-copper underline" download>
                    Checkpoint times track
                  </a>
                </p>
              </Card>
            </div>
          </div>
          <Versions lessonId={lesson.id} clock={clock} />
        </>
      ) : null}
    </>
  );
}

function LessonHeader({ lesson, clock, meId }: { lesson: LessonDto; clock: SchoolClock; meId: string }) {
  const owner = lesson.owner?.id === meId ? 'you' : (lesson.owner?.name ?? 'a former member of staff');
  return (
    <div className="mb-4">
      <div className="flex flex-wrap items-center gap-3">
        <h1 className="text-3xl break-words">{lesson.title}</h1>
        <LessonStateBadge state={lesson.state} />
        {lesson.shared ? <SharedBadge /> : null}
      </div>
      <p className="mt-1 text-ink-muted">
        <span className="font-bold text-ink">{versionText(lesson)}</span> · Made by {owner} · Draft saved{' '}
        {formatDateTime(lesson.savedAt, clock)}
        {lesson.savedBy && lesson.savedBy.id !== lesson.owner?.id ? ` by ${lesson.savedBy.name}` : ''}
      </p>
    </div>
  );
}

function Versions({ lessonId, clock }: { lessonId: string; clock: SchoolClock }) {
  const versions = useVersions(lessonId);
  return (
    <section aria-labelledby="versions-heading" className="mt-10 flex flex-col gap-4">
      <h2 id="versions-heading" className="text-2xl">
        Versions
      </h2>
      {versions.isPending ? <Loading label="Loading the versions…" /> : null}
      {versions.isError ? <ErrorBanner error={versions.error} title="The versions could not be loaded" /> : null}
      {versions.data ? <VersionList lessonId={lessonId} versions={versions.data.versions} clock={clock} /> : null}
    </section>
  );
}
