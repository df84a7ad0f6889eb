import type { Header } from '@tanstack/react-table';
import { flexRender } from '@tanstack/react-table';
import { ArrowDown, ArrowUp, ArrowUpDown } from 'lucide-react';

/** A column header that sorts on click or Enter, and tells screen readers the current order via aria-sort. */
export function SortableHeader<T>({ header }: { header: Header<T, unknown> }) {
  const label = flexRender(header.column.columnDef.header, header.getContext());
  if (!header.column.getCanSort()) {
    return (
      <th scope="col" className="px-4 py-3 text-left text-xs font-semibold uppercase tracking-wide text-ink-muted">
        {label}
      </th>
    );
  }
  const sorted = header.column.getIsSorted();
  const Icon = sorted === 'asc' ? ArrowUp : sorted === 'desc' ? ArrowDown : ArrowUpDown;
  return (
    <th scope="col" aria-sort={sorted === 'asc' ? 'ascending' : sorted === 'desc' ? 'descending' : 'none'} className="px-2 py-1.5 text-left">
      <button
        type="button"
        onClick={header.column.getToggleSortingHandler()}
        className="inline-flex min-h-11 items-center gap-1.5 rounded-lg px-2 text-xs font-semibold uppercase tracking-wide text-ink-muted hover:text-ink focus-ring"
      >
        {label}
        <Icon aria-hidden className="size-3.5" />
      </button>
    </th>
  );
}
