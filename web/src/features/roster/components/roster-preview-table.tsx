import { createColumnHelper, type ColumnDef } from '@tanstack/react-table';
import type { RosterRowDto } from '@core/contracts';
import { Badge } from '@/components/ui/badge';
import { DataTable } from '@/components/ui/data-table';
import { AlertIcon, CheckIcon } from '@/components/ui/icons';

const column = createColumnHelper<RosterRowDto>();

const columns: ColumnDef<RosterRowDto, unknown>[] = [
  column.display({ id: 'line', header: 'Line', cell: ({ row }) => <span className="font-mono">{row.original.line}</span> }),
  column.display({
    id: 'check',
    header: 'Check',
    cell: ({ row }) =>
      row.original.errors.length > 0 ? (
        <div className="flex min-w-56 items-start gap-2 font-bold text-danger">
          <AlertIcon className="mt-1 size-4 shrink-0" />
          <ul>
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
  column.display({ id: 'email', header: 'E-mail', cell: ({ row }) => <span className="font-mono text-sm break-all">{row.original.email || '—'}</span> }),
  column.display({ id: 'name', header: 'Name', cell: ({ row }) => row.original.name || '—' }),
  column.display({ id: 'roles', header: 'Roles', cell: ({ row }) => row.original.roles.join(', ') || '—' }),
  column.display({ id: 'class', header: 'Class', cell: ({ row }) => row.original.className ?? <span className="text-ink-muted">none</span> }),
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
