import { Fragment, useState, type ReactNode } from 'react';
import {
  flexRender,
  getCoreRowModel,
  getSortedRowModel,
  useReactTable,
  type ColumnDef,
  type Row,
  type SortingState,
} from '@tanstack/react-table';
import { ArrowDown, ArrowUp, ArrowUpDown } from 'lucide-react';
import { cn } from '@/lib/cn';

/** Per-column display hints (kept out of TanStack's global ColumnMeta to avoid clashing augmentations). */
export interface ColumnHints {
  numeric?: boolean;
}

function hintsOf(meta: unknown): ColumnHints {
  return (meta ?? {}) as ColumnHints;
}

export interface SortableTableProps<T> {
  caption: string;
  data: T[];
  columns: ColumnDef<T, any>[];
  /** Rows are shown in sections by this key, sorting applies inside each section. */
  groupBy?: (row: T) => string;
  groupOrder?: string[];
  renderGroupHeader?: (key: string, rows: T[]) => ReactNode;
  /** Cells of a totals row, one per column. */
  totals?: ReactNode[];
  rowKey: (row: T) => string;
}

/** A compact table with sortable headers (aria-sort) and optional grouped sections. */
export function SortableTable<T>({ caption, data, columns, groupBy, groupOrder, renderGroupHeader, totals, rowKey }: SortableTableProps<T>) {
  const [sorting, setSorting] = useState<SortingState>([]);
  const table = useReactTable({
    data,
    columns,
    state: { sorting },
    onSortingChange: setSorting,
    getCoreRowModel: getCoreRowModel(),
    getSortedRowModel: getSortedRowModel(),
    getRowId: (row) => rowKey(row),
  });
  const rows = table.getRowModel().rows;
  const sections = groupRows(rows, groupBy, groupOrder);
  const columnCount = table.getVisibleLeafColumns().length;

  return (
    <table className="w-full border-collapse text-sm">
      <caption className="sr-only">{caption}</caption>
      <thead className="sticky top-0 bg-paper-raised">
        {table.getHeaderGroups().map((headerGroup) => (
          <tr key={headerGroup.id} className="border-b border-paper-line">
            {headerGroup.headers.map((header) => {
              const sorted = header.column.getIsSorted();
              const numeric = hintsOf(header.column.columnDef.meta).numeric;
              const canSort = header.column.getCanSort();
              const label = flexRender(header.column.columnDef.header, header.getContext());
              return (
                <th
                  key={header.id}
                  scope="col"
                  aria-sort={sorted === 'asc' ? 'ascending' : sorted === 'desc' ? 'descending' : canSort ? 'none' : undefined}
                  className={cn('px-2 py-1 font-medium text-ink-soft', numeric ? 'text-right' : 'text-left')}
                >
                  {canSort ? (
                    <button
                      type="button"
                      onClick={header.column.getToggleSortingHandler()}
                      className={cn(
                        'inline-flex min-h-[32px] items-center gap-1 rounded px-1 focus-visible:outline focus-visible:outline-2 focus-visible:outline-accent',
                        numeric && 'flex-row-reverse',
                      )}
                    >
                      {label}
                      {sorted === 'asc' ? (
                        <ArrowUp aria-hidden="true" className="h-3.5 w-3.5" />
                      ) : sorted === 'desc' ? (
                        <ArrowDown aria-hidden="true" className="h-3.5 w-3.5" />
                      ) : (
                        <ArrowUpDown aria-hidden="true" className="h-3.5 w-3.5 opacity-40" />
                      )}
                    </button>
                  ) : (
                    label
                  )}
                </th>
              );
            })}
          </tr>
        ))}
      </thead>
      <tbody>
        {sections.map((section) => (
          <Fragment key={section.key}>
            {groupBy && renderGroupHeader && (
              <tr className="bg-paper-sunk">
                <th scope="rowgroup" colSpan={columnCount} className="px-2 py-1 text-left text-xs font-semibold text-ink-muted">
                  {renderGroupHeader(section.key, section.rows.map((row) => row.original))}
                </th>
              </tr>
            )}
            {section.rows.map((row) => (
              <tr key={row.id} className="border-b border-paper-line/60">
                {row.getVisibleCells().map((cell) => (
                  <td
                    key={cell.id}
                    className={cn('px-2 py-1 align-top', hintsOf(cell.column.columnDef.meta).numeric && 'text-right tabular-nums whitespace-nowrap')}
                  >
                    {flexRender(cell.column.columnDef.cell, cell.getContext())}
                  </td>
                ))}
              </tr>
            ))}
          </Fragment>
        ))}
      </tbody>
      {totals && (
        <tfoot>
          <tr className="border-t-2 border-ink-soft font-semibold">
            {totals.map((content, index) => (
              <td
                key={index}
                className={cn('px-2 py-1', hintsOf(table.getVisibleLeafColumns()[index]?.columnDef.meta).numeric && 'text-right tabular-nums whitespace-nowrap')}
              >
                {content}
              </td>
            ))}
          </tr>
        </tfoot>
      )}
    </table>
  );
}

function groupRows<T>(rows: Row<T>[], groupBy?: (row: T) => string, groupOrder?: string[]) {
  if (!groupBy) return [{ key: 'all', rows }];
  const byKey = new Map<string, Row<T>[]>();
  for (const row of rows) {
    const key = groupBy(row.original);
    const list = byKey.get(key);
    if (list) list.push(row);
    else byKey.set(key, [row]);
  }
  const order = groupOrder ?? [];
  const rank = (key: string) => {
    const index = order.indexOf(key);
    return index < 0 ? order.length : index;
  };
  return [...byKey.entries()]
    .sort(([a], [b]) => rank(a) - rank(b) || a.localeCompare(b))
    .map(([key, list]) => ({ key, rows: list }));
}
