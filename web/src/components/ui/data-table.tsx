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
  className?: string;
};

// On phones each row becomes a stacked block whose cells carry their column's name (from data-label);
// explicit ARIA roles keep it a table for screen readers even when CSS changes its display.
const STACK_TABLE = 'max-sm:block';
const STACK_ROW = 'max-sm:block max-sm:py-2';
const STACK_CELL_LABELLED =
  'max-sm:grid max-sm:grid-cols-[6.5rem_minmax(0,1fr)] max-sm:justify-items-start max-sm:gap-3 max-sm:py-1 max-sm:before:text-sm max-sm:before:font-bold max-sm:before:text-ink-muted max-sm:before:content-[attr(data-label)]';
const STACK_CELL_PLAIN = 'max-sm:block max-sm:py-1';

function headerLabel(header: unknown): string {
  return typeof header === 'string' ? header : '';
}

/** A TanStack table rendered as a real table (server-side paging: it shows the rows it is given); rows stack on phones. */
export function DataTable<T>({ data, columns, caption, getRowId, rowClassName, empty, className }: DataTableProps<T>) {
  // The app does not run the React Compiler, so its memoization warning about TanStack Table does not apply.
  // eslint-disable-next-line react-hooks/incompatible-library -- see the line above
  const table = useReactTable({ data, columns, getCoreRowModel: getCoreRowModel(), getRowId });
  const rows = table.getRowModel().rows;
  return (
    <div
      className={cn('overflow-x-auto rounded-lg border border-line bg-surface', className)}
      tabIndex={0}
      role="region"
      aria-label={typeof caption === 'string' ? caption : undefined}
    >
      <table role="table" className={cn('w-full border-collapse text-left', STACK_TABLE)}>
        <caption className="sr-only">{caption}</caption>
        <thead role="rowgroup" className="bg-sunken max-sm:sr-only">
          {table.getHeaderGroups().map((group) => (
            <tr role="row" key={group.id}>
              {group.headers.map((header) => (
                <th
                  role="columnheader"
                  key={header.id}
                  scope="col"
                  className="border-b border-line px-4 py-2.5 text-sm font-bold whitespace-nowrap text-ink"
                >
                  {header.isPlaceholder ? null : flexRender(header.column.columnDef.header, header.getContext())}
                </th>
              ))}
            </tr>
          ))}
        </thead>
        <tbody role="rowgroup" className={STACK_TABLE}>
          {rows.length === 0 ? (
            <tr role="row" className={STACK_ROW}>
              <td role="cell" colSpan={columns.length} className={cn('px-4 py-6 text-ink-muted', STACK_CELL_PLAIN)}>
                {empty ?? 'Nothing to show.'}
              </td>
            </tr>
          ) : (
            rows.map((row) => (
              <tr role="row" key={row.id} className={cn('border-b border-line align-top last:border-b-0', STACK_ROW, rowClassName?.(row))}>
                {row.getVisibleCells().map((cell) => {
                  const label = headerLabel(cell.column.columnDef.header);
                  return (
                    <td
                      role="cell"
                      key={cell.id}
                      data-label={label}
                      className={cn('px-4 py-3', label ? STACK_CELL_LABELLED : STACK_CELL_PLAIN)}
                    >
                      {flexRender(cell.column.columnDef.cell, cell.getContext())}
                    </td>
                  );
                })}
              </tr>
            ))
          )}
        </tbody>
      </table>
    </div>
  );
}
