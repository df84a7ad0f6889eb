/**
 * Piece labels: one per cut piece, laid out on one label-stock grid.
 * Units: mm (lengths shown in the design's units).
 */
import type { CutListItem } from '../analysis/types';
import type { DesignDocument } from '../design/schema';
import { formatLength } from '../units';

/**
 * The label stock Slotwise prints on: A4 sheets (210 × 297 mm) of 24 labels, 3 across and 8 down,
 * each 70 × 37 mm, no gaps, no side margins and 0.5 mm top and bottom. A common blank label size;
 * check your sheets' own layout before printing (common practice, no source).
 */
export const LABEL_GRID = {
  sheet: { width: 210, height: 297 },
  columns: 3,
  rows: 8,
  label: { width: 70, height: 37 },
  margin: { top: 0.5, left: 0 },
  gap: { x: 0, y: 0 },
} as const;

export const LABELS_PER_SHEET = LABEL_GRID.columns * LABEL_GRID.rows;

export interface PieceLabel {
  pieceId: string;
  name: string;
  /** The cut length in the design's units, e.g. "1400 mm" or "55-1/8 in". */
  length: string;
  machining: string[];
  designName: string;
  revision: number;
  buildId: number;
  /** The step that first uses the piece, or null when no step does. */
  stepId: string | null;
}

/** The path that opens a build at a step (the labels' QR codes carry it with the site's origin). */
export function buildStepPath(buildId: number, stepId: string | null): string {
  return stepId ? `/workbench/builds/${buildId}?tab=build&step=${encodeURIComponent(stepId)}` : `/workbench/builds/${buildId}?tab=build`;
}

export function pieceLabels(
  design: Pick<DesignDocument, 'name' | 'units'>,
  cutList: CutListItem[],
  firstStep: Map<string, string>,
  build: { id: number; revision: number },
): PieceLabel[] {
  return cutList.map((piece) => ({
    pieceId: piece.id,
    name: piece.label,
    length: formatLength(piece.length, design.units),
    machining: [
      ...(piece.ends.start.kind !== 'plain' ? [piece.ends.start.description] : []),
      ...(piece.ends.end.kind !== 'plain' ? [piece.ends.end.description] : []),
      ...piece.machining.filter((op) => op.kind !== 'end-tap').map((op) => op.description),
    ],
    designName: design.name,
    revision: build.revision,
    buildId: build.id,
    stepId: firstStep.get(piece.id) ?? null,
  }));
}

/** Splits labels into sheets of LABELS_PER_SHEET. */
export function labelSheets<T>(labels: T[]): T[][] {
  const sheets: T[][] = [];
  for (let index = 0; index < labels.length; index += LABELS_PER_SHEET) sheets.push(labels.slice(index, index + LABELS_PER_SHEET));
  return sheets;
}
