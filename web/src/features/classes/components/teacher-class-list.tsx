import { Link } from 'react-router-dom';
import type { ClassDto } from '@core/contracts';
import { Badge } from '@/components/ui/badge';
import { Card } from '@/components/ui/card';
import { EmptyState } from '@/components/ui/empty-state';
import { PeopleIcon } from '@/components/ui/icons';
import { JoinCode } from './join-code';

/** A teacher's classes as cards: name, department, how many students, and the code students join with. */
export function TeacherClassList({ classes, classHref }: { classes: ClassDto[]; classHref: (classId: string) => string }) {
  if (classes.length === 0) {
    return (
      <EmptyState icon={<PeopleIcon className="size-8" />} title="No classes yet">
        Your school admin creates classes and names you as their teacher. Each one then appears here with its join code, which you give to
        students so they can join.
      </EmptyState>
    );
  }
  return (
    <ul className="grid gap-4 md:grid-cols-2">
      {classes.map((item) => (
        <li key={item.id}>
          <Card className="flex h-full flex-col gap-3">
            <div className="flex flex-wrap items-start justify-between gap-2">
              <h3 className="text-xl">
                <Link
                  to={classHref(item.id)}
                  className="text-ink underline decoration-copper decoration-2 underline-offset-4 hover:text-copper"
                >
                  {item.name}
                </Link>
              </h3>
              {item.departmentName ? <Badge>{item.departmentName}</Badge> : null}
            </div>
            <p className="flex items-center gap-2">
              <PeopleIcon className="size-5 text-teal" />
              <span>
                <span className="font-mono font-bold">{item.studentCount}</span> {item.studentCount === 1 ? 'student' : 'students'} enrolled
              </span>
            </p>
            <JoinCode code={item.joinCode} className={item.name} />
          </Card>
        </li>
      ))}
    </ul>
  );
}
