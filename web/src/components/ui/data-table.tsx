import { flexRender, getCoreRowModel, useReactTable, type ColumnDef, type Row } from '@tanstack/react-table';
import type { ReactNode } from 'react';
import { cn } from '@/lib/cn';

type DataTableProps<T> = {
  data: T[];
  columns: ColumnDef<T, unknown>[];
  caption: ReactNode;
  getRowId?: (row: T) => string;
  rowClassName?: (row: Row<T>) => string | undefined;
  empty?: ReactNode;
  /** Server-side paging and filtering: the table shows the rows it is given, as they are. */
  className?: string;
};

/** A TanStack table rendered as a real <table>; it scrolls sideways on narrow screens instead of squeezing. */
export function DataTable<T>({ data, columns, caption, getRowId, rowClassName, empty, className }: DataTableProps<T>) {
  // The app does not run the React Compiler, so its memoization warning about TanStack Table does not apply.
  // eslint-disable-next-line react-hooks/incompatible-library -- see the line above
  const table = useReactTable({ data, columns, getCoreRowModel: getCoreRowModel(), getRowId });
  const rows = table.getRowModel().rows;
  return (
    <div className={cn('overflow-x-auto rounded-lg border border-line bg-surface', className)} tabIndex={0} role="region" aria-label={typeof caption === 'string' ? caption : undefined}>
      <table className="w-full border-collapse text-left">
        <caption className="sr-only">{caption}</caption>
        <thead className="bg-sunken">
          {table.getHeaderGroups().map((group) => (
            <tr key={group.id}>
              {group.headers.map((header) => (
                <th key={header.id} scope="col" className="border-b border-line px-4 py-2.5 text-sm font-bold whitespace-nowrap text-ink">
                  {header.isPlaceholder ? null : flexRender(header.column.columnDef.header, header.getContext())}
                </th>
              ))}
            </tr>
          ))}
        </thead>
        <tbody>
          {rows.length === 0 ? (
            <tr>
              <td colSpan={columns.length} className="px-4 py-6 text-ink-muted">
                {empty ?? 'Nothing to show.'}
              </td>
            </tr>
          ) : (
            rows.map((row) => (
              <tr key={row.id} className={cn('border-b border-line last:border-b-0 align-top', rowClassName?.(row))}>
                {row.getVisibleCells().map((cell) => (
                  <td key={cell.id} className="px-4 py-3">
                    {flexRender(cell.column.columnDef.cell, cell.getContext())}
                  </td>
                ))}
              </tr>
            ))
          )}
        </tbody>
      </table>
    </div>
  );
}
