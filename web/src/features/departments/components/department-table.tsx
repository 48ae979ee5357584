import { createColumnHelper, type ColumnDef } from '@tanstack/react-table';
import type { DepartmentDto } from '@core/contracts';
import { DataTable } from '@/components/ui/data-table';

const column = createColumnHelper<DepartmentDto>();
const columns: ColumnDef<DepartmentDto, unknown>[] = [
  column.display({ id: 'name', header: 'Department', cell: ({ row }) => <span className="font-bold">{row.original.name}</span> }),
  column.display({ id: 'classes', header: 'Classes', cell: ({ row }) => <span className="font-mono">{row.original.classCount}</span> }),
  column.display({ id: 'members', header: 'Staff', cell: ({ row }) => <span className="font-mono">{row.original.memberCount}</span> }),
];

export function DepartmentTable({ departments }: { departments: DepartmentDto[] }) {
  return (
    <DataTable
      data={departments}
      columns={columns}
      caption="The school's departments"
      getRowId={(item) => item.id}
      empty="No departments yet. Create the first one with the form on this page."
    />
  );
}
