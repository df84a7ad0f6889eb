import { downloadBlob } from '@/lib/download';
import { toCsv } from '@/domain/outputs/csv';
import type { BomLine, CutListGroup, CutMachiningOperation, EndTreatment } from '@/domain/analysis/types';
import type { LengthUnit } from '@/domain/units';
import { formatLength, mmToInches } from '@/domain/units';

// CSV exports keep plain numbers (no unit suffixes) so spreadsheets can sum them; units go in headers.

const round = (value: number, places: number) => Number(value.toFixed(places));

export const BOM_CSV_HEADER = [
  'Code',
  'Description',
  'Category',
  'Quantity',
  'Unit',
  'Unit mass (kg)',
  'Unit price (USD, demo)',
  'Line price (USD, demo)',
] as const;

export function bomToCsv(lines: BomLine[]): string {
  const rows = lines.map((line) => [
    line.code,
    line.description,
    line.category,
    round(line.quantity, 3),
    line.unit,
    round(line.unitMass, 4),
    round(line.unitPrice, 2),
    round(line.linePrice, 2),
  ]);
  const total = lines.reduce((sum, line) => sum + line.linePrice, 0);
  rows.push(['Total', '', '', '', '', '', '', round(total, 2)]);
  return toCsv(rows, { fields: BOM_CSV_HEADER });
}

export function describeEnd(end: EndTreatment): string {
  return end.thread ? `${end.description} (${end.thread})` : end.description;
}

const MACHINING_NAMES: Record<CutMachiningOperation['kind'], string> = {
  'access-counterbore': 'Access counterbore',
  'access-hole': 'Access hole',
  'end-tap': 'Tap',
  drill: 'Drill',
};

/** "Access counterbore Ø 7.5 mm, 20 mm from start, face 0": positions always name the end they are measured from. */
export function describeMachining(op: CutMachiningOperation, units: LengthUnit): string {
  const diameter =
    op.diameter === null ? '' : ` Ø ${units === 'in' ? formatLength(op.diameter, 'in', { style: 'decimal', decimals: 3 }) : formatLength(op.diameter, 'mm', { decimals: 1 })}`;
  const position = op.kind === 'end-tap' ? `${op.fromEnd} end` : `${formatLength(op.offset, units)} from ${op.fromEnd}`;
  return `${MACHINING_NAMES[op.kind] ?? op.kind}${diameter}, ${position}, face ${op.face}`;
}

export function cutListCsvHeader(units: LengthUnit): string[] {
  const lengthColumns = units === 'in' ? ['Length (in)', 'Length (shop fraction)'] : ['Length (mm)'];
  return [
    'Pieces',
    'Variant',
    ...lengthColumns,
    'Quantity',
    units === 'in' ? 'Tolerance (± in)' : 'Tolerance (± mm)',
    'Start end',
    'End end',
    'Machining',
  ];
}

export function cutListToCsv(groups: CutListGroup[], pieceLabels: Record<string, string>, units: LengthUnit): string {
  const rows = groups.map((group) => {
    const lengthValues =
      units === 'in'
        ? [round(mmToInches(group.length), 4), formatLength(group.length, 'in', { style: 'fraction', denominator: 32 })]
        : [round(group.length, 1)];
    return [
      group.profileIds.map((id) => pieceLabels[id] ?? id).join(' '),
      group.variantId,
      ...lengthValues,
      group.quantity,
      units === 'in' ? round(mmToInches(group.tolerance), 4) : group.tolerance,
      describeEnd(group.ends.start),
      describeEnd(group.ends.end),
      group.machining.map((op) => describeMachining(op, units)).join('; '),
    ];
  });
  return toCsv(rows, { fields: cutListCsvHeader(units) });
}

/** Starts a browser download of a CSV text. */
export function downloadCsv(fileName: string, csv: string): void {
  downloadBlob(fileName, new Blob([csv], { type: 'text/csv;charset=utf-8' }));
}
