import { useParams } from 'react-router-dom';
import { BackLink } from '@/components/ui/back-link';
import { Badge } from '@/components/ui/badge';
import { ErrorBanner } from '@/components/ui/error-banner';
import { PageHeader } from '@/components/ui/page-header';
import { Loading } from '@/components/ui/spinner';
import { paths } from '@/config/paths';
import { useClass } from '@/features/classes/api/get-class';
import { ClassRosterTable } from '@/features/classes/components/class-roster-table';
import { JoinCode } from '@/features/classes/components/join-code';
import { ClassAssignmentsSection } from '../assignments/class-assignments-section';
import { useSchoolClock } from './use-school-clock';

/** One of the teacher's classes: its join code and the students enrolled. */
export default function TeacherClassRoute() {
  const { classId = '' } = useParams();
  const detail = useClass(classId);
  const clock = useSchoolClock();
  return (
    <>
      <BackLink to={paths.teacher.home}>Your classes</BackLink>
      {detail.isPending ? <Loading label="Loading the class…" /> : null}
      {detail.isError ? <ErrorBanner error={detail.error} title="This class could not be loaded" /> : null}
      {detail.data ? (
        <>
          <PageHeader
            title={detail.data.name}
            description={detail.data.departmentName ? <Badge>{detail.data.departmentName}</Badge> : undefined}
          />
          <div className="mb-6">
            <JoinCode code={detail.data.joinCode} className={detail.data.name} />
          </div>
          <ClassAssignmentsSection classId={detail.data.id} classTitle={detail.data.name} locale={clock.locale} />
          <h2 className="mb-3 text-2xl">Students ({detail.data.students.length})</h2>
          <ClassRosterTable students={detail.data.students} clock={clock} caption={`Students in ${detail.data.name}`} />
        </>
      ) : null}
    </>
  );
}
