import { createColumnHelper, type ColumnDef } from '@tanstack/react-table';
import type { RosterRowDto } from '@core/contracts';
import { Badge } from '@/components/ui/badge';
import { DataTable } from '@/components/ui/data-table';
import { AlertIcon, CheckIcon } from '@/components/ui/icons';
import { EmailAddress } from '@/components/ui/email-address';

const column = createColumnHelper<RosterRowDto>();

const columns: ColumnDef<RosterRowDto, unknown>[] = [
  column.display({ id: 'line', header: 'Line', cell: ({ row }) => <span className="font-mono">{row.original.line}</span> }),
  column.display({
    id: 'check',
    header: 'Check',
    cell: ({ row }) =>
      row.original.errors.length > 0 ? (
        <div className="flex items-start gap-2 font-bold wrap-anywhere text-danger sm:min-w-52">
          <AlertIcon className="mt-1 size-4 shrink-0" />
          <ul className="flex flex-col gap-1">
            {row.original.errors.map((message) => (
              <li key={message}>{message}</li>
            ))}
          </ul>
        </div>
      ) : (
        <span className="flex items-center gap-2 font-bold whitespace-nowrap text-success">
          <CheckIcon className="size-4" />
          Ready
        </span>
      ),
  }),
  column.display({
    id: 'person',
    header: 'Name and e-mail',
    cell: ({ row }) => (
      <div>
        <div className="font-bold sm:whitespace-nowrap">{row.original.name || '(no name)'}</div>
        <div className="text-ink-muted">
          {row.original.email ? <EmailAddress email={row.original.email} className="sm:whitespace-nowrap" /> : '(no e-mail)'}
        </div>
      </div>
    ),
  }),
  column.display({ id: 'roles', header: 'Roles', cell: ({ row }) => row.original.roles.join(', ') || '—' }),
  column.display({
    id: 'class',
    header: 'Class',
    cell: ({ row }) =>
      row.original.className ? (
        <span className="block sm:min-w-28">{row.original.className}</span>
      ) : (
        <span className="text-ink-muted">none</span>
      ),
  }),
  column.display({
    id: 'existing',
    header: 'In the school',
    cell: ({ row }) => (row.original.existing ? <Badge tone="field">Already a member</Badge> : <Badge>New</Badge>),
  }),
];

/** The server's reading of each CSV row; rows with problems are marked by an icon and their messages, and tinted. */
export function RosterPreviewTable({ rows }: { rows: RosterRowDto[] }) {
  return (
    <DataTable
      data={rows}
      columns={columns}
      caption="Roster preview, one row per line of the file"
      getRowId={(row) => String(row.line)}
      rowClassName={(row) => (row.original.errors.length > 0 ? 'bg-danger-soft' : undefined)}
      empty="The file has a header but no people."
    />
  );
}
