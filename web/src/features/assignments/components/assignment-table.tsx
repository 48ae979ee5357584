import type { ColumnDef } from '@tanstack/react-table';
import type { ReactNode } from 'react';
import { Link } from 'react-router-dom';
import type { AssignmentDto } from '@core/contracts';
import { DataTable } from '@/components/ui/data-table';
import { schoolDateTime } from '../school-time';
import { PhaseBadge } from './phase-badge';

type AssignmentTableProps = {
  assignments: AssignmentDto[];
  /** The column that tells rows apart: the lesson on a class's page, the class on a lesson's. */
  name: 'lesson' | 'class';
  locale: string;
  caption: string;
  href: (assignmentId: string) => string;
  empty: ReactNode;
};

/** Assignments with their version, due time in school time, phase and how many students are done. */
export function AssignmentTable({ assignments, name, locale, caption, href, empty }: AssignmentTableProps) {
  const columns: ColumnDef<AssignmentDto, unknown>[] = [
    {
      id: 'name',
      header: name === 'lesson' ? 'Lesson' : 'Class',
      cell: ({ row }) => (
        <Link to={href(row.original.id)} className="font-bold text-copper underline">
          {name === 'lesson' ? row.original.lesson.title : row.original.class.name}
        </Link>
      ),
    },
    { id: 'version', header: 'Version', cell: ({ row }) => <span className="font-mono">v{row.original.versionNumber}</span> },
    {
      id: 'due',
      header: 'Due',
      cell: ({ row }) => schoolDateTime(row.original.dueAt, row.original.timeZone, locale),
    },
    { id: 'phase', header: 'State', cell: ({ row }) => <PhaseBadge phase={row.original.phase} /> },
    {
      id: 'done',
      header: 'Done',
      cell: ({ row }) => (
        <span>
          <span className="font-mono font-bold">{row.original.counts.done}</span> of{' '}
          <span className="font-mono">{row.original.counts.students}</span>
        </span>
      ),
    },
  ];
  return <DataTable data={assignments} columns={columns} caption={caption} getRowId={(row) => row.id} empty={empty} />;
}
