import type { DesignAnalysis } from '../../../src/domain/analysis/analyze';

export interface BomDiffRow {
  code: string;
  description: string;
  unit: string;
  before: number;
  after: number;
  /** after − before, in the line's unit (pieces, m or m²). */
  change: number;
}

export interface CutDiffRow {
  variantId: string;
  /** Cut length, mm. */
  length: number;
  before: number;
  after: number;
  change: number;
}

const round = (value: number) => Math.round(value * 1e6) / 1e6;

/** Bill-of-materials lines that differ between two analyses, keyed by part code and unit. */
export function bomDiff(before: DesignAnalysis, after: DesignAnalysis): BomDiffRow[] {
  const rows = new Map<string, BomDiffRow>();
  for (const [side, analysis] of [['before', before], ['after', after]] as const) {
    for (const line of analysis.bom) {
      const key = `${line.code}|${line.unit}`;
      const row = rows.get(key) ?? { code: line.code, description: line.description, unit: line.unit, before: 0, after: 0, change: 0 };
      row[side] = round(row[side] + line.quantity);
      rows.set(key, row);
    }
  }
  return [...rows.values()]
    .map((row) => ({ ...row, change: round(row.after - row.before) }))
    .filter((row) => row.change !== 0)
    .sort((a, b) => a.code.localeCompare(b.code));
}

/** Cut-list pieces whose count differs, keyed by profile variant and length (mm, to 0.1 mm). */
export function cutListDiff(before: DesignAnalysis, after: DesignAnalysis): CutDiffRow[] {
  const rows = new Map<string, CutDiffRow>();
  for (const [side, analysis] of [['before', before], ['after', after]] as const) {
    for (const group of analysis.cutGroups) {
      const length = Math.round(group.length * 10) / 10;
      const key = `${group.variantId}|${length}`;
      const row = rows.get(key) ?? { variantId: group.variantId, length, before: 0, after: 0, change: 0 };
      row[side] += group.quantity;
      rows.set(key, row);
    }
  }
  return [...rows.values()]
    .map((row) => ({ ...row, change: row.after - row.before }))
    .filter((row) => row.change !== 0)
    .sort((a, b) => a.variantId.localeCompare(b.variantId) || a.length - b.length);
}
