import { useNavigate, useParams } from 'react-router-dom';
import { BackLink } from '@/components/ui/back-link';
import { Card } from '@/components/ui/card';
import { ErrorBanner } from '@/components/ui/error-banner';
import { Loading } from '@/components/ui/spinner';
import { paths } from '@/config/paths';
import { useAssignment } from '@/features/assignments/api/get-assignment';
import { AssignmentCounts } from '@/features/assignments/components/assignment-counts';
import { AssignmentFacts } from '@/features/assignments/components/assignment-facts';
import { DeleteAssignment } from '@/features/assignments/components/delete-assignment';
import { EditAssignmentForm } from '@/features/assignments/components/edit-assignment-form';
import { PhaseBadge } from '@/features/assignments/components/phase-badge';
import { useSchoolClock } from '../homes/use-school-clock';
import { MoveSection } from './move-section';

/** One assignment of a lesson to a class: its facts and progress; who manages it edits, moves or deletes it here. */
export default function AssignmentDetailRoute() {
  const { assignmentId = '' } = useParams();
  const navigate = useNavigate();
  const { locale } = useSchoolClock();
  const detail = useAssignment(assignmentId);
  const assignment = detail.data;
  return (
    <>
      <BackLink to={assignment ? paths.teacher.class(assignment.class.id) : paths.teacher.home}>
        {assignment ? assignment.class.name : 'Your classes'}
      </BackLink>
      {detail.isPending ? <Loading label="Loading the assignment…" /> : null}
      {detail.isError && !assignment ? <ErrorBanner error={detail.error} title="This assignment could not be loaded" /> : null}
      {assignment ? (
        <>
          <div className="mb-6">
            <div className="flex flex-wrap items-center gap-3">
              <h1 className="text-3xl break-words">{assignment.lesson.title}</h1>
              <PhaseBadge phase={assignment.phase} />
            </div>
            <p className="mt-1 text-ink-muted">
              Assigned to <span className="font-bold text-ink">{assignment.class.name}</span> · version {assignment.versionNumber}
            </p>
          </div>
          <div className="grid gap-6 lg:grid-cols-[minmax(0,3fr)_minmax(0,2fr)]">
            <div className="flex flex-col gap-6">
              <Card aria-labelledby="progress-heading">
                <h2 id="progress-heading" className="mb-3 text-xl">
                  Progress
                </h2>
                <AssignmentCounts counts={assignment.counts} />
              </Card>
              <Card aria-labelledby="facts-heading">
                <h2 id="facts-heading" className="mb-3 text-xl">
                  Dates and policies
                </h2>
                <AssignmentFacts
                  assignment={assignment}
                  locale={locale}
                  lessonHref={paths.lessons.overview(paths.teacher.home, assignment.lesson.id)}
                  classHref={paths.teacher.class(assignment.class.id)}
                />
              </Card>
            </div>
            <div className="flex flex-col gap-6">
              {assignment.canManage ? (
                <>
                  <Card aria-labelledby="version-heading">
                    <h2 id="version-heading" className="mb-3 text-xl">
                      Version
                    </h2>
                    <MoveSection assignment={assignment} />
                  </Card>
                  <Card aria-labelledby="delete-heading">
                    <h2 id="delete-heading" className="mb-3 text-xl">
                      Delete
                    </h2>
                    <DeleteAssignment assignment={assignment} onDeleted={() => void navigate(paths.teacher.class(assignment.class.id))} />
                  </Card>
                </>
              ) : (
                <Card aria-labelledby="readonly-heading">
                  <h2 id="readonly-heading" className="mb-2 text-xl">
                    Read-only
                  </h2>
                  <p className="text-ink-muted">
                    {assignment.createdBy.name} assigned this lesson. The class’s teacher, whoever assigned it and the school admin can
                    change it.
                  </p>
                </Card>
              )}
            </div>
          </div>
          {assignment.canManage ? (
            <Card aria-labelledby="edit-heading" className="mt-6 max-w-3xl">
              <h2 id="edit-heading" className="mb-1 text-xl">
                Change dates and policies
              </h2>
              <p className="mb-4 text-sm text-ink-muted">Answers already given stay; the new dates and policies apply from now on.</p>
              <EditAssignmentForm key={assignment.id} assignment={assignment} locale={locale} />
            </Card>
          ) : null}
        </>
      ) : null}
    </>
  );
}
