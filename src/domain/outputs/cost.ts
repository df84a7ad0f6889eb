/**
 * Cost from the (demo) price list: profile metres, one saw cut per piece, each machining
 * operation, connectors, screws, T-nuts, accessories, and panels by m².
 */
import type { BomLine, CostCategory, CostLine, CostSummary } from '../analysis/types';
import type { AnalysisContext } from '../analysis/context';
import { sheetCode, sheetName } from './bom';
import type { PanelSheet } from './panelSheets';

export function costSummary(ctx: AnalysisContext, bom: BomLine[], sheets: PanelSheet[]): CostSummary {
  const prices = ctx.catalogue.catalogue.prices;
  const lines: CostLine[] = [];
  for (const b of bom) {
    if (b.category === 'panel') continue;
    lines.push({ code: b.code, description: b.description, category: b.category, quantity: b.quantity, unit: b.unit, unitPrice: b.unitPrice, linePrice: b.linePrice });
  }
  // Panels by m², one line per material and thickness.
  const panelLines = new Map<string, CostLine>();
  for (const s of sheets) {
    const p = s.info.panel;
    const key = `${p.materialId}-${p.thickness}`;
    const line = panelLines.get(key) ?? {
      code: sheetCode(p.materialId, p.thickness),
      description: `${sheetName(s.info.material?.name ?? 'Sheet', p.thickness)} sheet`,
      category: 'panel' as const,
      quantity: 0,
      unit: 'm²' as const,
      unitPrice: s.pricePerSquareMetre,
      linePrice: 0,
    };
    line.quantity += s.area;
    panelLines.set(key, line);
  }
  for (const line of panelLines.values()) {
    line.quantity = Math.round(line.quantity * 1000) / 1000;
    line.linePrice = round2(line.quantity * line.unitPrice);
    lines.push(line);
  }
  if (ctx.profiles.length > 0) {
    lines.push({
      code: 'SW-SVC-CUT',
      description: 'Saw cut to length',
      category: 'cutting',
      quantity: ctx.profiles.length,
      unit: 'pcs',
      unitPrice: prices.perCut,
      linePrice: round2(ctx.profiles.length * prices.perCut),
    });
  }
  // Counted in runs of one kind (a frame's legs each have an end tap), added to the map per run:
  // the kinds keep the order they first appear in.
  const machiningCounts = new Map<string, number>();
  let runKind: string | undefined;
  let runCount = 0;
  const profiles = ctx.profiles;
  for (let p = 0; p < profiles.length; p++) {
    const machining = profiles[p].profile.machining;
    for (let k = 0; k < machining.length; k++) {
      const kind = machining[k].kind;
      if (kind === runKind) runCount++;
      else {
        if (runKind !== undefined) machiningCounts.set(runKind, (machiningCounts.get(runKind) ?? 0) + runCount);
        runKind = kind;
        runCount = 1;
      }
    }
  }
  if (runKind !== undefined) machiningCounts.set(runKind, (machiningCounts.get(runKind) ?? 0) + runCount);
  for (const [kind, count] of [...machiningCounts.entries()].sort()) {
    const unitPrice = prices.perMachining[kind as keyof typeof prices.perMachining] ?? 0;
    lines.push({
      code: `SW-SVC-${kind.toUpperCase()}`,
      description: `Machining: ${kind.replace(/-/g, ' ')}`,
      category: 'machining',
      quantity: count,
      unit: 'pcs',
      unitPrice,
      linePrice: round2(count * unitPrice),
    });
  }
  const subtotalByCategory: Partial<Record<CostCategory, number>> = {};
  let total = 0;
  for (const line of lines) {
    subtotalByCategory[line.category] = round2((subtotalByCategory[line.category] ?? 0) + line.linePrice);
    total += line.linePrice;
  }
  return { lines, subtotalByCategory, total: round2(total), currency: 'USD', note: 'demo prices' };
}

function round2(v: number): number {
  return Math.round(v * 100) / 100;
}
