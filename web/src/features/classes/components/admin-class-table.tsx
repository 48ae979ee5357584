import { createColumnHelper, type ColumnDef } from '@tanstack/react-table';
import { Link } from 'react-router-dom';
import type { ClassDto } from '@core/contracts';
import { DataTable } from '@/components/ui/data-table';

const column = createColumnHelper<ClassDto>();

function columnsFor(classHref: (classId: string) => string): ColumnDef<ClassDto, unknown>[] {
  return [
    column.display({
      id: 'name',
      header: 'Class',
      cell: ({ row }) => (
        <Link
          to={classHref(row.original.id)}
          className="font-bold text-ink underline decoration-copper decoration-2 underline-offset-4 hover:text-copper"
        >
          {row.original.name}
        </Link>
      ),
    }),
    column.display({
      id: 'department',
      header: 'Department',
      cell: ({ row }) => row.original.departmentName ?? <span className="text-ink-muted">None</span>,
    }),
    column.display({
      id: 'teacher',
      header: 'Teacher',
      cell: ({ row }) => row.original.teacher?.name ?? <span className="text-ink-muted">None</span>,
    }),
    column.display({
      id: 'students',
      header: 'Students',
      cell: ({ row }) => <span className="font-mono">{row.original.studentCount}</span>,
    }),
    column.display({
      id: 'code',
      header: 'Join code',
      cell: ({ row }) => <code className="font-mono font-bold tracking-wider">{row.original.joinCode}</code>,
    }),
  ];
}

export function AdminClassTable({ classes, classHref }: { classes: ClassDto[]; classHref: (classId: string) => string }) {
  return (
    <DataTable
      data={classes}
      columns={columnsFor(classHref)}
      caption="The school's classes"
      getRowId={(item) => item.id}
      empty="No classes yet. Create the first one with the form on this page."
    />
  );
}
