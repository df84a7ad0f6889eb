/**
 * Bill of materials grouped by part code: profiles by variant (metres, with the piece count),
 * connectors, screws and T-nuts from the joints, panels by material, thickness and size,
 * accessories by piece, gasket and slot cover by length.
 */
import type { BomLine } from '../analysis/types';
import type { AnalysisContext } from '../analysis/context';
import type { HardwareSummary } from './hardware';
import type { PanelSheet } from './panelSheets';

const CATEGORY_ORDER = ['profile', 'connector', 'fastener', 't-nut', 'panel', 'accessory', 'gasket', 'slot-cover'];

export function billOfMaterials(ctx: AnalysisContext, hardware: HardwareSummary, sheets: PanelSheet[]): BomLine[] {
  const lines = new Map<string, BomLine>();
  const prices = ctx.catalogue.catalogue.prices;

  const profileLines = new Map<string, BomLine>();
  // Frames list many profiles of one variant in a row: the last line is reused without a look-up.
  let lastId: string | undefined;
  let lastLine: BomLine | undefined;
  const profiles = ctx.profiles;
  for (let p = 0; p < profiles.length; p++) {
    const info = profiles[p];
    const id = info.profile.variantId;
    let line = id === lastId ? lastLine : profileLines.get(id);
    if (!line) {
      const v = info.variant;
      line = {
        code: v?.partCode ?? id,
        description: v ? v.name : `Unknown profile variant ${id}`,
        category: 'profile',
        quantity: 0,
        unit: 'm',
        unitMass: v?.massPerMetre ?? 0,
        unitPrice: prices.profilePerMetre[id] ?? 0,
        linePrice: 0,
        lineMass: 0,
        pieces: 0,
        partIds: [],
      };
      lines.set(`profile|${id}`, line);
      profileLines.set(id, line);
    }
    line.quantity += info.profile.length / 1000;
    line.pieces = (line.pieces ?? 0) + 1;
    line.partIds.push(info.profile.id);
    lastId = id;
    lastLine = line;
  }

  for (const h of hardware.lines) {
    lines.set(`${h.category}|${h.partId}`, {
      code: h.partCode,
      description: h.description,
      category: h.category,
      quantity: h.quantity,
      unit: h.unit,
      unitMass: h.unitMass,
      unitPrice: h.unitPrice,
      linePrice: 0,
      lineMass: 0,
      partIds: h.sourceIds,
    });
  }

  // Panels by material, thickness, size, notched corners and cut-out count, looked up level by
  // level (the same grouping as a key string of the six, without a new string per panel). Their
  // lines come after the profile and hardware lines, in the order first seen.
  const panelLines: BomLine[] = [];
  const byMaterial: PanelKeys = new Map();
  for (const s of sheets) {
    const p = s.info.panel;
    const w = round1(s.info.sheetWidth);
    const hgt = round1(s.info.sheetHeight);
    const last = level(level(level(level(byMaterial, p.materialId), p.thickness), w), hgt);
    let byCutouts = last.get(s.notch.corners) as Map<number, BomLine> | undefined;
    if (!byCutouts) last.set(s.notch.corners, (byCutouts = new Map()));
    let line = byCutouts.get(p.cutouts.length);
    if (!line) {
      const name = s.info.material?.name ?? 'Sheet';
      line = {
        code: sheetCode(p.materialId, p.thickness),
        description: `${sheetName(name, p.thickness)}, ${w} × ${hgt} mm${s.notch.corners > 0 ? `, ${s.notch.corners} corner ${s.notch.corners === 1 ? 'notch' : 'notches'} ${s.notch.size} mm` : ''}${p.cutouts.length > 0 ? `, ${p.cutouts.length} ${p.cutouts.length === 1 ? 'cut-out' : 'cut-outs'}` : ''}`,
        category: 'panel',
        quantity: 0,
        unit: 'pcs',
        unitMass: s.mass,
        unitPrice: round2(s.area * s.pricePerSquareMetre),
        linePrice: 0,
        lineMass: 0,
        partIds: [],
      };
      byCutouts.set(p.cutouts.length, line);
      panelLines.push(line);
    }
    line.quantity += 1;
    line.partIds.push(p.id);
  }

  const out = [...lines.values()];
  for (const line of panelLines) out.push(line);
  for (const line of out) {
    line.quantity = line.unit === 'pcs' ? line.quantity : round3(line.quantity);
    line.unitMass = round4(line.unitMass);
    line.linePrice = round2(line.quantity * line.unitPrice);
    line.lineMass = round4(line.quantity * line.unitMass);
  }
  return out.sort(
    (a, b) => CATEGORY_ORDER.indexOf(a.category) - CATEGORY_ORDER.indexOf(b.category) || (a.code < b.code ? -1 : a.code > b.code ? 1 : 0),
  );
}

/** Panel lines under material, thickness, width, height, notched corners, cut-out count. */
type PanelKeys = Map<string | number, PanelKeys | Map<number, BomLine>>;

/** The map under `key`, made on first use. */
function level(node: PanelKeys, key: string | number): PanelKeys {
  let next = node.get(key) as PanelKeys | undefined;
  if (!next) node.set(key, (next = new Map()));
  return next;
}

function round1(v: number): number {
  return Math.round(v * 10) / 10;
}
function round2(v: number): number {
  return Math.round(v * 100) / 100;
}
function round3(v: number): number {
  return Math.round(v * 1000) / 1000;
}
function round4(v: number): number {
  return Math.round(v * 10000) / 10000;
}

/** Our part code for a sheet: "SW-SHT-PLYWOOD-6" (material and thickness in mm), never the catalogue id. */
export function sheetCode(materialId: string, thickness: number): string {
  return `SW-SHT-${materialId.toUpperCase().replace(/[^A-Z0-9]+/g, '')}-${String(thickness).replace('.', '_')}`;
}

/** "Plywood 6 mm", without repeating a thickness the material's name already gives. */
export function sheetName(materialName: string, thickness: number): string {
  return materialName.includes(`${thickness} mm`) ? materialName : `${materialName} ${thickness} mm`;
}
