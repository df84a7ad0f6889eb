/** Sheet size, area, mass and price of each panel; captured panels include slot engagement. */
import type { PanelCutItem } from '../analysis/types';
import { panelPricePerSquareMetre } from '../catalogue';
import type { PanelMaterial } from '../catalogue/types';
import type { AnalysisContext, PanelInfo } from '../analysis/context';
import { panelCornerNotches } from '../analysis/panelNotches';

export interface PanelSheet {
  info: PanelInfo;
  /** m², less cut-outs and notches */
  area: number;
  /** kg */
  mass: number;
  /** price per m² at this thickness */
  pricePerSquareMetre: number;
  notch: { size: number; corners: number };
}

export function panelSheets(ctx: AnalysisContext): PanelSheet[] {
  // Price per material and thickness, worked out once (it sorts the material's price rows).
  const prices = new Map<PanelMaterial, Map<number, number>>();
  const priceOf = (material: PanelMaterial, thickness: number): number => {
    let byThickness = prices.get(material);
    if (!byThickness) prices.set(material, (byThickness = new Map()));
    let price = byThickness.get(thickness);
    if (price === undefined) byThickness.set(thickness, (price = panelPricePerSquareMetre(material, thickness)));
    return price;
  };
  return ctx.panels.map((info) => {
    const notch = panelCornerNotches(ctx, info);
    const cutouts = info.panel.cutouts.reduce((sum, c) => sum + (Math.PI / 4) * c.diameter * c.diameter, 0);
    const mm2 = Math.max(0, info.sheetWidth * info.sheetHeight - cutouts - notch.corners * notch.size * notch.size);
    const area = mm2 / 1e6;
    const density = info.material?.density ?? 0;
    return {
      info,
      area,
      mass: area * (info.panel.thickness / 1000) * density,
      pricePerSquareMetre: info.material ? priceOf(info.material, info.panel.thickness) : 0,
      notch: { size: notch.size, corners: notch.corners },
    };
  });
}

export function panelCutItems(sheets: PanelSheet[]): PanelCutItem[] {
  return sheets.map(({ info, notch }) => ({
    panelId: info.panel.id,
    materialId: info.panel.materialId,
    thickness: info.panel.thickness,
    width: round(info.sheetWidth),
    height: round(info.sheetHeight),
    mounting: info.panel.mounting,
    cornerNotch: notch.size,
    notchedCorners: notch.corners,
  }));
}

function round(v: number): number {
  return Math.round(v * 100) / 100;
}
