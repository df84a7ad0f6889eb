import { useMemo, useState } from 'react';
import { createColumnHelper, flexRender, getCoreRowModel, getSortedRowModel, useReactTable, type SortingState } from '@tanstack/react-table';
import type { User } from '@/domain/contracts';
import { ROLE_LABELS } from '@/lib/session/roles';
import { formatDate } from '@/lib/format';
import { ActiveToggleCell } from './ActiveToggleCell';
import { RoleCell } from './RoleCell';
import { SortableHeader } from './SortableHeader';
import { StatusBadge } from './StatusBadge';

const column = createColumnHelper<User>();

/** The shop's accounts: sortable by name, role, status and date; role and active state change in place. */
export function UsersTable({ users, currentUserId }: { users: User[]; currentUserId: number }) {
  const [sorting, setSorting] = useState<SortingState>([{ id: 'displayName', desc: false }]);
  const columns = useMemo(
    () => [
      column.accessor('displayName', {
        header: 'Name',
        cell: ({ row }) => (
          <div className="flex flex-col">
            <span className="font-medium text-ink">
              {row.original.displayName}
              {row.original.id === currentUserId ? <span className="ml-2 text-xs font-normal text-ink-muted">(you)</span> : null}
            </span>
            <span className="text-xs text-ink-muted">{row.original.email}</span>
          </div>
        ),
      }),
      column.accessor('role', {
        header: 'Role',
        sortingFn: (a, b) => ROLE_LABELS[a.original.role].localeCompare(ROLE_LABELS[b.original.role]),
        cell: ({ row }) => <RoleCell user={row.original} isSelf={row.original.id === currentUserId} />,
      }),
      column.accessor('active', {
        header: 'Status',
        sortingFn: (a, b) => Number(b.original.active) - Number(a.original.active),
        cell: ({ getValue }) => <StatusBadge active={getValue()} />,
      }),
      column.accessor('createdAt', {
        header: 'Added',
        cell: ({ getValue }) => <time dateTime={getValue()} className="tabular-nums text-ink-soft">{formatDate(getValue())}</time>,
      }),
      column.display({
        id: 'actions',
        header: () => <span className="sr-only">Actions</span>,
        cell: ({ row }) => <ActiveToggleCell user={row.original} isSelf={row.original.id === currentUserId} />,
      }),
    ],
    [currentUserId],
  );

  const table = useReactTable({
    data: users,
    columns,
    state: { sorting },
    onSortingChange: setSorting,
    getCoreRowModel: getCoreRowModel(),
    getSortedRowModel: getSortedRowModel(),
    getRowId: (user) => String(user.id),
  });

  return (
    <div className="overflow-x-auto rounded-card border border-paper-line bg-paper-raised">
      <table className="w-full min-w-[720px] border-collapse text-sm">
        <caption className="sr-only">People in the shop, sortable by column</caption>
        <thead className="border-b border-paper-line bg-paper-sunk/60">
          {table.getHeaderGroups().map((group) => (
            <tr key={group.id}>
              {group.headers.map((header) => (
                <SortableHeader key={header.id} header={header} />
              ))}
            </tr>
          ))}
        </thead>
        <tbody>
          {table.getRowModel().rows.map((row) => (
            <tr key={row.id} className="border-b border-paper-line last:border-b-0">
              {row.getVisibleCells().map((cell) => (
                <td key={cell.id} className="px-4 py-3 align-middle">
                  {flexRender(cell.column.columnDef.cell, cell.getContext())}
                </td>
              ))}
            </tr>
          ))}
        </tbody>
      </table>
    </div>
  );
}
