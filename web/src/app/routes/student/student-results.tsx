import { Link, useParams } from 'react-router-dom';
import { BackLink } from '@/components/ui/back-link';
import { buttonVariants } from '@/components/ui/button';
import { ErrorBanner } from '@/components/ui/error-banner';
import { PageHeader } from '@/components/ui/page-header';
import { Loading } from '@/components/ui/spinner';
import { paths } from '@/config/paths';
import { datesLine } from '@/features/student-assignments/assignment-words';
import { CompletionSummary } from '@/features/student-assignments/components/completion-summary';
import { StateBadge } from '@/features/student-assignments/components/state-badge';
import { shortSchoolTime, type SchoolTime } from '@/features/student-assignments/school-time';
import { useStudentResults } from '@/features/student-results/api/get-student-results';
import { ResultsView } from '@/features/student-results/components/results-view';
import { useSchoolClock } from '../homes/use-school-clock';

/** A student's results for one assigned lesson: completion, score, and each question with their answers and, as policy allows, the answer. */
export default function StudentResultsRoute() {
  const { assignmentId = '' } = useParams();
  // Reading the results marks them seen on the server; the home asks again when it opens, so its "Grade updated" goes.
  const results = useStudentResults(assignmentId);
  const clock = useSchoolClock();
  const data = results.data;
  // The results carry no server time; the browser's clock only decides whether a year is shown.
  const time: SchoolTime | null = data ? { timeZone: data.assignment.timeZone, locale: clock.locale, now: new Date().toISOString() } : null;
  return (
    <>
      <BackLink to={paths.student.home}>Your lessons</BackLink>
      {results.isPending ? <Loading label="Loading your results…" /> : null}
      {results.isError ? <ErrorBanner error={results.error} title="Your results could not be loaded" /> : null}
      {data && time ? (
        <>
          <PageHeader
            title={`Your results: ${data.assignment.lessonTitle}`}
            description={
              <span className="flex flex-wrap items-center gap-2">
                {data.assignment.className}
                <StateBadge state={data.assignment.state} />
              </span>
            }
            actions={
              data.assignment.accepting ? (
                <Link to={paths.student.watch(data.assignment.id)} className={buttonVariants({ variant: 'secondary' })}>
                  Back to the lesson
                </Link>
              ) : undefined
            }
          />
          <div className="flex flex-col gap-6">
            <p className="font-bold">
              {datesLine(data.assignment, time)}
              <span className="font-normal text-ink-muted"> (school time, {data.assignment.timeZone})</span>
            </p>
            <CompletionSummary completion={data.completion} time={time} />
            <ResultsView results={data} formatWhen={(iso) => shortSchoolTime(iso, time)} />
          </div>
        </>
      ) : null}
    </>
  );
}
