import { useQueryClient } from '@tanstack/react-query';
import { useState } from 'react';
import { useParams } from 'react-router-dom';
import type { ClassMemberDto } from '@core/contracts';
import { BackLink } from '@/components/ui/back-link';
import { Badge } from '@/components/ui/badge';
import { Button } from '@/components/ui/button';
import { Card } from '@/components/ui/card';
import { ErrorBanner } from '@/components/ui/error-banner';
import { PageHeader } from '@/components/ui/page-header';
import { Loading } from '@/components/ui/spinner';
import { paths } from '@/config/paths';
import { useEnrolStudents } from '@/features/classes/api/enrol-students';
import { useClass } from '@/features/classes/api/get-class';
import { useRemoveEnrolment } from '@/features/classes/api/remove-enrolment';
import { ClassRosterTable } from '@/features/classes/components/class-roster-table';
import { JoinCode } from '@/features/classes/components/join-code';
import { peopleKeys } from '@/features/people/api/keys';
import { StudentPicker } from '@/features/people/components/student-picker';
import { useSchoolClock } from '../homes/use-school-clock';

/** Remove asks once more in place, so a slip of the finger does not take a student out of a class. */
function RemoveStudent({ student, onRemove, busy }: { student: ClassMemberDto; onRemove: () => void; busy: boolean }) {
  const [confirming, setConfirming] = useState(false);
  if (!confirming) {
    return (
      <Button variant="danger" size="sm" onClick={() => setConfirming(true)} aria-label={`Remove ${student.name} from the class`}>
        Remove
      </Button>
    );
  }
  return (
    <span className="flex flex-wrap gap-2">
      <Button variant="danger" size="sm" busy={busy} onClick={onRemove}>
        Yes, remove {student.name}
      </Button>
      <Button variant="secondary" size="sm" onClick={() => setConfirming(false)}>
        Keep
      </Button>
    </span>
  );
}

/** One class for the admin: its students, enrolling more from the school's students, and removing them. */
export default function ClassDetailRoute() {
  const { classId = '' } = useParams();
  const clock = useSchoolClock();
  const queryClient = useQueryClient();
  const detail = useClass(classId);
  const enrol = useEnrolStudents();
  const remove = useRemoveEnrolment();
  // A person's list of classes (on the People page) changes with their enrolments.
  const refreshPeople = () => queryClient.invalidateQueries({ queryKey: peopleKeys.all });

  return (
    <>
      <BackLink to={paths.admin.classes}>All classes</BackLink>
      {detail.isPending ? <Loading label="Loading the class…" /> : null}
      {detail.isError ? <ErrorBanner error={detail.error} title="This class could not be loaded" /> : null}
      {detail.data ? (
        <>
          <PageHeader
            title={detail.data.name}
            description={
              <span className="flex flex-wrap gap-2">
                {detail.data.departmentName ? <Badge>{detail.data.departmentName}</Badge> : <Badge>No department</Badge>}
                <Badge tone="field">{detail.data.teacher ? `Teacher: ${detail.data.teacher.name}` : 'No teacher yet'}</Badge>
              </span>
            }
          />
          <div className="mb-6">
            <JoinCode code={detail.data.joinCode} className={detail.data.name} />
          </div>
          <div className="grid gap-8 lg:grid-cols-[1fr_22rem]">
            <section aria-labelledby="students-heading" className="flex min-w-0 flex-col gap-3">
              <h2 id="students-heading" className="text-2xl">
                Students ({detail.data.students.length})
              </h2>
              {remove.isError ? <ErrorBanner error={remove.error} title="The student was not removed" /> : null}
              <ClassRosterTable
                students={detail.data.students}
                clock={clock}
                caption={`Students in ${detail.data.name}`}
                renderAction={(student) => (
                  <RemoveStudent
                    student={student}
                    busy={remove.isPending && remove.variables.userId === student.userId}
                    onRemove={() => remove.mutate({ classId, userId: student.userId }, { onSuccess: () => void refreshPeople() })}
                  />
                )}
              />
            </section>
            <Card aria-labelledby="enrol-heading" className="flex h-fit flex-col gap-3">
              <h2 id="enrol-heading" className="text-xl">
                Enrol students
              </h2>
              <StudentPicker
                excludeIds={new Set(detail.data.students.map((student) => student.userId))}
                busy={enrol.isPending}
                onPick={(userIds) => enrol.mutateAsync({ classId, userIds }).then(refreshPeople)}
              />
              {enrol.isError ? <ErrorBanner error={enrol.error} title="Nobody was enrolled" /> : null}
              {enrol.isSuccess ? (
                <p aria-live="polite" className="font-bold text-success">
                  Enrolled. The list of students is up to date.
                </p>
              ) : null}
            </Card>
          </div>
        </>
      ) : null}
    </>
  );
}
