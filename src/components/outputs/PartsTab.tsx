import { useMemo } from 'react';
import type { ColumnDef } from '@tanstack/react-table';
import type { BomCategory, BomLine } from '@/domain/analysis/types';
import type { LengthUnit } from '@/domain/units';
import { SortableTable } from './SortableTable';
import { CsvButton } from './CsvButton';
import { bomToCsv } from './csv';
import { csvFileName, formatMoney, showMass, showQuantity, showSaleUnit, showUnitMass, showUnitPrice } from './format';

export const BOM_CATEGORY_ORDER: BomCategory[] = ['profile', 'connector', 'fastener', 't-nut', 'panel', 'accessory', 'gasket', 'slot-cover'];

export const BOM_CATEGORY_NAMES: Record<string, string> = {
  profile: 'Profiles',
  connector: 'Connectors',
  fastener: 'Screws',
  't-nut': 'T-nuts',
  panel: 'Panels',
  accessory: 'Accessories',
  gasket: 'Gasket',
  'slot-cover': 'Slot cover strip',
  cutting: 'Cutting',
  machining: 'Machining',
};

export interface PartsTabProps {
  lines: BomLine[];
  units: LengthUnit;
  designName: string;
  selectedIds?: ReadonlySet<string>;
  onSelectParts?: (ids: string[], mode: 'replace' | 'add') => void;
}

/** The bill of materials, in sections by category, with a totals row and a CSV download. */
export function PartsTab({ lines, units, designName, selectedIds, onSelectParts }: PartsTabProps) {
  // eslint-disable-next-line @typescript-eslint/no-explicit-any -- TanStack Table's value type differs per column
  const columns = useMemo<ColumnDef<BomLine, any>[]>(
    () => [
      { id: 'code', header: 'Code', accessorKey: 'code', cell: (c) => <code className="text-xs">{c.getValue()}</code> },
      { id: 'description', header: 'Description', accessorKey: 'description' },
      {
        id: 'quantity',
        header: 'Qty',
        accessorKey: 'quantity',
        meta: { numeric: true },
        cell: (c) => {
          const line = c.row.original;
          return (
            <span>
              {showQuantity(line.quantity, line.unit, units)}
              {line.pieces !== undefined && <span className="block text-xs text-ink-muted">{line.pieces} pieces</span>}
            </span>
          );
        },
      },
      { id: 'unit', header: 'Unit', accessorKey: 'unit', cell: (c) => showSaleUnit(c.row.original.unit, units) },
      {
        id: 'unitMass',
        header: 'Unit mass',
        accessorKey: 'unitMass',
        meta: { numeric: true },
        cell: (c) => showUnitMass(c.row.original.unitMass, c.row.original.unit, units),
      },
      {
        id: 'unitPrice',
        header: 'Unit price',
        accessorKey: 'unitPrice',
        meta: { numeric: true },
        cell: (c) => showUnitPrice(c.row.original.unitPrice, c.row.original.unit, units),
      },
      { id: 'linePrice', header: 'Line price', accessorKey: 'linePrice', meta: { numeric: true }, cell: (c) => formatMoney(c.getValue()) },
    ],
    [units],
  );

  const totalPrice = lines.reduce((sum, line) => sum + line.linePrice, 0);
  const totalMass = lines.reduce((sum, line) => sum + line.lineMass, 0);

  return (
    <div className="flex flex-col gap-2">
      <div className="flex items-center justify-between gap-2">
        <p className="text-xs text-ink-muted">Bill of materials · prices are demo prices</p>
        <CsvButton label="Download parts CSV" fileName={csvFileName(designName, 'parts')} build={() => bomToCsv(lines)} />
      </div>
      <SortableTable
        caption="Bill of materials"
        data={lines}
        columns={columns}
        rowKey={(line) => `${line.category}:${line.code}`}
        rowPartIds={(line) => line.partIds}
        selectedIds={selectedIds}
        onSelectParts={onSelectParts}
        groupBy={(line) => line.category}
        groupOrder={BOM_CATEGORY_ORDER}
        renderGroupHeader={(key, rows) => `${BOM_CATEGORY_NAMES[key] ?? key} · ${rows.length} ${rows.length === 1 ? 'line' : 'lines'}`}
        totals={['Total', `${lines.length} lines`, '', '', `${showMass(totalMass, units)} in all`, '', formatMoney(totalPrice)]}
      />
    </div>
  );
}
