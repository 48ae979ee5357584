import type { StudentClassDto } from '@core/contracts';
import { Card } from '@/components/ui/card';
import { EmptyState } from '@/components/ui/empty-state';
import { PeopleIcon } from '@/components/ui/icons';
import { formatDate, type SchoolClock } from '@/lib/format';

/** The classes a student is in: name, teacher, department and when they joined. */
export function StudentClassList({ classes, clock }: { classes: StudentClassDto[]; clock: SchoolClock }) {
  if (classes.length === 0) {
    return (
      <EmptyState icon={<PeopleIcon className="size-8" />} title="You are not in a class yet">
        Ask your teacher for your class code: 8 letters and digits, like K7QM2XPA. Enter it in “Join a class” and the class appears here.
      </EmptyState>
    );
  }
  return (
    <ul className="grid gap-4 sm:grid-cols-2">
      {classes.map((item) => (
        <li key={item.id}>
          <Card className="flex h-full flex-col gap-1">
            <h3 className="text-xl">{item.name}</h3>
            <p>{item.teacherName ? `Teacher: ${item.teacherName}` : 'No teacher named yet'}</p>
            {item.departmentName ? <p className="text-ink-muted">{item.departmentName}</p> : null}
            <p className="text-sm text-ink-muted">Joined {formatDate(item.enrolledAt, clock)}</p>
          </Card>
        </li>
      ))}
    </ul>
  );
}
