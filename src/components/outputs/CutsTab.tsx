import { useMemo } from 'react';
import type { ColumnDef } from '@tanstack/react-table';
import type { CutListGroup, CutListItem } from '@/domain/analysis/types';
import type { LengthUnit } from '@/domain/units';
import { SortableTable } from './SortableTable';
import { CsvButton } from './CsvButton';
import { cutListToCsv, describeEnd, describeMachining } from './csv';
import { csvFileName, showLength, showTolerance, variantName } from './format';

export interface CutsTabProps {
  groups: CutListGroup[];
  items: CutListItem[];
  units: LengthUnit;
  designName: string;
  /** Selected part ids (rows holding them are highlighted) and the row-click handler. */
  selectedIds?: ReadonlySet<string>;
  onSelectParts?: (ids: string[], mode: 'replace' | 'add') => void;
}

/** The cut list: interchangeable pieces together, in sections by profile variant. */
export function CutsTab({ groups, items, units, designName, selectedIds, onSelectParts }: CutsTabProps) {
  const pieceLabels = useMemo(() => Object.fromEntries(items.map((item) => [item.id, item.label || item.id])), [items]);
  // eslint-disable-next-line @typescript-eslint/no-explicit-any -- TanStack Table's value type differs per column
  const columns = useMemo<ColumnDef<CutListGroup, any>[]>(
    () => [
      {
        id: 'piece',
        header: 'Piece',
        accessorFn: (group) => group.profileIds.map((id) => pieceLabels[id] ?? id).join(', '),
        cell: (c) => <span className="text-xs">{c.getValue()}</span>,
      },
      { id: 'variant', header: 'Variant', accessorKey: 'variantId', cell: (c) => <code className="text-xs">{c.getValue()}</code> },
      { id: 'length', header: 'Length', accessorKey: 'length', meta: { numeric: true }, cell: (c) => showLength(c.getValue(), units) },
      { id: 'quantity', header: 'Qty', accessorKey: 'quantity', meta: { numeric: true }, cell: (c) => `${c.getValue()} ${c.getValue() === 1 ? 'pc' : 'pcs'}` },
      { id: 'tolerance', header: 'Tolerance', accessorKey: 'tolerance', meta: { numeric: true }, cell: (c) => showTolerance(c.getValue(), units) },
      {
        id: 'ends',
        header: 'Ends',
        enableSorting: false,
        cell: (c) => (
          <span className="text-xs">
            start: {describeEnd(c.row.original.ends.start)}
            <br />
            end: {describeEnd(c.row.original.ends.end)}
          </span>
        ),
      },
      {
        id: 'machining',
        header: 'Machining',
        enableSorting: false,
        cell: (c) =>
          c.row.original.machining.length === 0 ? (
            <span className="text-xs text-ink-muted">none</span>
          ) : (
            <ul className="text-xs">
              {c.row.original.machining.map((op) => (
                <li key={op.id}>{describeMachining(op, units)}</li>
              ))}
            </ul>
          ),
      },
    ],
    [units, pieceLabels],
  );

  const pieceCount = groups.reduce((sum, group) => sum + group.quantity, 0);
  const totalLength = groups.reduce((sum, group) => sum + group.length * group.quantity, 0);

  return (
    <div className="flex flex-col gap-2">
      <div className="flex items-center justify-between gap-2">
        <p className="text-xs text-ink-muted">Cut list · machining positions are measured from the end named</p>
        <CsvButton label="Download cuts CSV" fileName={csvFileName(designName, 'cuts')} build={() => cutListToCsv(groups, pieceLabels, units)} />
      </div>
      <SortableTable
        caption="Cut list"
        data={groups}
        columns={columns}
        rowKey={(group) => group.groupKey}
        rowPartIds={(group) => group.profileIds}
        selectedIds={selectedIds}
        onSelectParts={onSelectParts}
        groupBy={(group) => group.variantId}
        renderGroupHeader={(variantId, rows) => `${variantName(variantId)} · ${rows.reduce((sum, group) => sum + group.quantity, 0)} pieces`}
        totals={['Total', '', showLength(totalLength, units), `${pieceCount} pcs`, '', '', '']}
      />
    </div>
  );
}
