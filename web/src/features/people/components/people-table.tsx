import { createColumnHelper, type ColumnDef } from '@tanstack/react-table';
import type { PersonDto } from '@core/contracts';
import { Badge } from '@/components/ui/badge';
import { DataTable } from '@/components/ui/data-table';
import { formatDateTime, type SchoolClock } from '@/lib/format';
import { RoleEditor } from './role-editor';
import { EmailAddress } from '@/components/ui/email-address';

const column = createColumnHelper<PersonDto>();

function columnsFor(clock: SchoolClock): ColumnDef<PersonDto, unknown>[] {
  return [
    column.display({
      id: 'person',
      header: 'Name and e-mail',
      cell: ({ row }) => (
        <div className="min-w-48">
          <div className="font-bold">{row.original.name}</div>
          <EmailAddress email={row.original.email} className="block text-ink-muted sm:whitespace-nowrap" />
        </div>
      ),
    }),
    column.display({
      id: 'status',
      header: 'Status',
      cell: ({ row }) => (row.original.status === 'active' ? <Badge tone="success">Active</Badge> : <Badge tone="copper">Invited</Badge>),
    }),
    column.display({ id: 'roles', header: 'Roles', cell: ({ row }) => <RoleEditor person={row.original} /> }),
    column.display({
      id: 'where',
      header: 'Department and classes',
      cell: ({ row }) => (
        <div className="min-w-40 text-sm">
          <div>{row.original.departmentName ?? <span className="text-ink-muted">No department</span>}</div>
          {row.original.classNames.length > 0 ? <div className="text-ink-muted">{row.original.classNames.join(', ')}</div> : null}
        </div>
      ),
    }),
    column.display({
      id: 'lastSignIn',
      header: 'Last sign-in',
      cell: ({ row }) => (
        <span className="text-sm whitespace-nowrap">
          {row.original.lastSignInAt ? formatDateTime(row.original.lastSignInAt, clock) : 'Never'}
        </span>
      ),
    }),
  ];
}

/** The people of the school, one page of them, as the server filtered them. */
export function PeopleTable({ people, clock }: { people: PersonDto[]; clock: SchoolClock }) {
  return (
    <DataTable
      data={people}
      columns={columnsFor(clock)}
      caption="People in the school"
      getRowId={(person) => person.userId}
      empty="Nobody matches this search."
    />
  );
}
