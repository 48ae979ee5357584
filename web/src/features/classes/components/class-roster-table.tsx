import { createColumnHelper, type ColumnDef } from '@tanstack/react-table';
import type { ReactNode } from 'react';
import type { ClassMemberDto } from '@core/contracts';
import { DataTable } from '@/components/ui/data-table';
import { formatDate, type SchoolClock } from '@/lib/format';
import { EmailAddress } from '@/components/ui/email-address';

const column = createColumnHelper<ClassMemberDto>();

type Props = {
  students: ClassMemberDto[];
  clock: SchoolClock;
  caption: string;
  /** Admins get a remove button per student; teachers only read the list. */
  renderAction?: (student: ClassMemberDto) => ReactNode;
};

/** The students enrolled in one class. */
export function ClassRosterTable({ students, clock, caption, renderAction }: Props) {
  const columns: ColumnDef<ClassMemberDto, unknown>[] = [
    column.display({ id: 'name', header: 'Name', cell: ({ row }) => <span className="font-bold">{row.original.name}</span> }),
    column.display({
      id: 'email',
      header: 'E-mail',
      cell: ({ row }) => <EmailAddress email={row.original.email} className="sm:whitespace-nowrap" />,
    }),
    column.display({
      id: 'enrolled',
      header: 'Enrolled',
      cell: ({ row }) => <span className="whitespace-nowrap">{formatDate(row.original.enrolledAt, clock)}</span>,
    }),
  ];
  if (renderAction) {
    columns.push(
      column.display({
        id: 'actions',
        header: () => <span className="sr-only">Actions</span>,
        cell: ({ row }) => renderAction(row.original),
      }),
    );
  }
  return (
    <DataTable
      data={students}
      columns={columns}
      caption={caption}
      getRowId={(student) => student.userId}
      empty="No students in this class yet."
    />
  );
}
