import { createColumnHelper, type ColumnDef } from '@tanstack/react-table';
import type { DepartmentOverviewDto } from '@core/contracts';
import { ROLE_LABELS, RoleSchema } from '@core/roles';
import { Card } from '@/components/ui/card';
import { DataTable } from '@/components/ui/data-table';
import { plural } from '@/lib/format';
import { EmailAddress } from '@/components/ui/email-address';

type Staff = DepartmentOverviewDto['staff'][number];
type DeptClass = DepartmentOverviewDto['classes'][number];

const staffColumn = createColumnHelper<Staff>();
const classColumn = createColumnHelper<DeptClass>();

function roleLabel(role: string): string {
  const parsed = RoleSchema.safeParse(role);
  return parsed.success ? ROLE_LABELS[parsed.data] : role;
}

const staffColumns: ColumnDef<Staff, unknown>[] = [
  staffColumn.display({ id: 'name', header: 'Name', cell: ({ row }) => <span className="font-bold">{row.original.name}</span> }),
  staffColumn.display({
    id: 'email',
    header: 'E-mail',
    cell: ({ row }) => <EmailAddress email={row.original.email} className="sm:whitespace-nowrap" />,
  }),
  staffColumn.display({ id: 'roles', header: 'Roles', cell: ({ row }) => row.original.roles.map(roleLabel).join(', ') }),
];

const classColumns: ColumnDef<DeptClass, unknown>[] = [
  classColumn.display({ id: 'name', header: 'Class', cell: ({ row }) => <span className="font-bold">{row.original.name}</span> }),
  classColumn.display({
    id: 'teacher',
    header: 'Teacher',
    cell: ({ row }) => row.original.teacher?.name ?? <span className="text-ink-muted">No teacher</span>,
  }),
  classColumn.display({
    id: 'students',
    header: 'Students',
    cell: ({ row }) => <span className="font-mono">{row.original.studentCount}</span>,
  }),
];

/** One department as a coordinator or substitute sees it: its staff and its classes with student counts. */
export function DepartmentOverview({ department }: { department: DepartmentOverviewDto }) {
  const students = department.classes.reduce((sum, item) => sum + item.studentCount, 0);
  return (
    <Card className="flex flex-col gap-5" aria-labelledby={`dept-${department.id}`}>
      <div>
        <h2 id={`dept-${department.id}`} className="text-2xl">
          {department.name}
        </h2>
        <p className="mt-1 text-ink-muted">
          {plural(department.staff.length, 'member of staff', 'members of staff')} · {plural(department.classes.length, 'class', 'classes')}{' '}
          · {plural(students, 'student')}
        </p>
      </div>
      <section className="flex flex-col gap-2">
        <h3 className="text-lg">Classes</h3>
        <DataTable
          data={department.classes}
          columns={classColumns}
          caption={`Classes of ${department.name}`}
          getRowId={(item) => item.id}
          empty="This department has no classes yet."
        />
      </section>
      <section className="flex flex-col gap-2">
        <h3 className="text-lg">Staff</h3>
        <DataTable
          data={department.staff}
          columns={staffColumns}
          caption={`Staff of ${department.name}`}
          getRowId={(item) => item.id}
          empty="No staff are in this department yet."
        />
      </section>
    </Card>
  );
}
