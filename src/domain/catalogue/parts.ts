/**
 * T-nuts, accessories, panel materials with prices, and the price list. Masses are estimates;
 * every price is a demo price, invented.
 */
import { fastenerId } from './fasteners';
import type { PanelMaterialSpec } from './materials';
import { SYSTEM_PREFIX, systemPartCode } from './systems';
import type { AccessoryPart, PanelMaterial, PriceList, ProfileSystem, ProfileVariant, TNutPart } from './types';

export const DEMO_PRICE_NOTE = 'Demo prices, invented. Not a quote from any supplier.';

const money = (v: number) => Math.round(v * 100) / 100;
/** kg from grams, to 0.1 g. */
const grams = (g: number) => Math.round(g * 10) / 10000;
const scale40 = (s: ProfileSystem) => s.outerSize / 40;

export function buildTNuts(systems: ProfileSystem[]): TNutPart[] {
  return systems.flatMap((s) => {
    const p = SYSTEM_PREFIX[s.id];
    const k = scale40(s);
    return [
      {
        id: `${p}-tnut-drop-in`,
        partCode: `SW-${systemPartCode(s.id)}-TN-DROP`,
        systemId: s.id,
        kind: 'drop-in' as const,
        name: `Drop-in T-nut ${s.screwSize}, ${s.name}`,
        screwSize: s.screwSize,
        unitMass: grams(6 * k ** 2),
        price: money(0.55 * (0.6 + 0.4 * k)),
      },
      {
        id: `${p}-tnut-slide-in`,
        partCode: `SW-${systemPartCode(s.id)}-TN-SLIDE`,
        systemId: s.id,
        kind: 'slide-in' as const,
        name: `Slide-in T-nut ${s.screwSize}, ${s.name}`,
        screwSize: s.screwSize,
        unitMass: grams(9 * k ** 2),
        price: money(0.35 * (0.6 + 0.4 * k)),
      },
    ];
  });
}

export function buildAccessories(systems: ProfileSystem[]): AccessoryPart[] {
  return systems.flatMap((s): AccessoryPart[] => {
    const p = SYSTEM_PREFIX[s.id];
    const code = `SW-${systemPartCode(s.id)}`;
    const k = scale40(s);
    const slotScrew = fastenerId('button', s.screwSize, slotScrewLengthFor(s));
    const base = { systemIds: [s.id] };
    return [
      { ...base, id: `${p}-leveling-foot`, partCode: `${code}-FOOT-LVL`, kind: 'leveling-foot', name: `Leveling foot ${s.endTapSize}, ${s.name}`, soldBy: 'each', unitMass: money(0.12 * k), price: money(4.2 * (0.6 + 0.4 * k)), threadSize: s.endTapSize, demoLoadRating: Math.round(2500 * k) },
      { ...base, id: `${p}-caster`, partCode: `${code}-CST-SWV`, kind: 'caster', name: `Swivel caster with brake, ${s.endTapSize} stem, ${s.name}`, soldBy: 'each', unitMass: money(0.35 * k), price: money(11.5 * (0.6 + 0.4 * k)), threadSize: s.endTapSize, demoLoadRating: Math.round(600 * k) },
      { ...base, id: `${p}-end-cap`, partCode: `${code}-CAP-END`, kind: 'end-cap', name: `End cap, ${s.name}`, soldBy: 'each', unitMass: grams(4 * k), price: money(0.45 * (0.6 + 0.4 * k)) },
      { ...base, id: `${p}-door-track`, partCode: `${code}-TRK-DOOR`, kind: 'door-track', name: `Sliding door track, ${s.name}`, soldBy: 'metre', unitMass: money(0.18 * k), price: money(9 * (0.6 + 0.4 * k)) },
      { ...base, id: `${p}-handle`, partCode: `${code}-HDL-BAR`, kind: 'handle', name: `Bar handle, ${s.name}`, soldBy: 'each', unitMass: money(0.08 * k), price: money(5.5 * (0.6 + 0.4 * k)), fasteners: [{ fastenerId: slotScrew, quantity: 2 }], tNutCount: 2 },
      { ...base, id: `${p}-latch`, partCode: `${code}-LCH-MAG`, kind: 'latch', name: `Magnetic latch, ${s.name}`, soldBy: 'each', unitMass: money(0.05 * k), price: money(4 * (0.6 + 0.4 * k)), fasteners: [{ fastenerId: slotScrew, quantity: 2 }], tNutCount: 2 },
      { ...base, id: `${p}-door-hinge`, partCode: `${code}-HNG-DOOR`, kind: 'hinge', name: `Door hinge, ${s.name}`, soldBy: 'each', unitMass: money(0.07 * k), price: money(5.9 * (0.6 + 0.4 * k)), fasteners: [{ fastenerId: slotScrew, quantity: 4 }], tNutCount: 4 },
      { ...base, id: `${p}-panel-gasket`, partCode: `${code}-GSK-PNL`, kind: 'gasket', name: `Panel gasket strip, ${s.name}`, soldBy: 'metre', unitMass: 0.02, price: money(1.6 * (0.6 + 0.4 * k)) },
      { ...base, id: `${p}-slot-cover`, partCode: `${code}-CVR-SLT`, kind: 'slot-cover', name: `Slot cover strip, ${s.name}`, soldBy: 'metre', unitMass: 0.03, price: money(1.9 * (0.6 + 0.4 * k)) },
    ];
  });
}

function slotScrewLengthFor(s: ProfileSystem): number {
  // Same screws as the corner bracket (connectors.ts).
  const byId: Record<ProfileSystem['id'], number> = { 'inch-1.0': 12.7, 'inch-1.5': 15.875, 'metric-20': 10, 'metric-30': 12, 'metric-40': 16, 'metric-45': 16 };
  return byId[s.id];
}

/** Demo price per m² at 3 mm and per extra mm, by material id (invented). */
const PANEL_PRICES: Record<string, { at3mm: number; perMm: number }> = {
  acrylic: { at3mm: 38, perMm: 12 },
  polycarbonate: { at3mm: 52, perMm: 16 },
  hdpe: { at3mm: 30, perMm: 9 },
  abs: { at3mm: 28, perMm: 8 },
  acm: { at3mm: 45, perMm: 6 },
  'perforated-aluminium': { at3mm: 70, perMm: 20 },
  plywood: { at3mm: 14, perMm: 2.2 },
  mdf: { at3mm: 9, perMm: 1.4 },
};
const FALLBACK_PANEL_PRICE = { at3mm: 40, perMm: 10 };

export function buildPanelMaterials(specs: PanelMaterialSpec[]): PanelMaterial[] {
  return specs.map((spec) => {
    const price = PANEL_PRICES[spec.id] ?? FALLBACK_PANEL_PRICE;
    return {
      ...spec,
      pricesPerSquareMetre: spec.thicknesses.map((t) => ({ thickness: t, price: money(price.at3mm + (t - 3) * price.perMm) })),
    };
  });
}

/** Demo price per m² for a thickness: exact where listed, else linear between neighbours. */
export function panelPricePerSquareMetre(material: PanelMaterial, thickness: number): number {
  const rows = [...material.pricesPerSquareMetre].sort((a, b) => a.thickness - b.thickness);
  if (rows.length === 0) return 0;
  if (thickness <= rows[0].thickness) return money((rows[0].price * thickness) / rows[0].thickness);
  for (let i = 1; i < rows.length; i++) {
    const a = rows[i - 1];
    const b = rows[i];
    if (thickness <= b.thickness) return money(a.price + ((thickness - a.thickness) / (b.thickness - a.thickness)) * (b.price - a.price));
  }
  const last = rows[rows.length - 1];
  return money((last.price * thickness) / last.thickness);
}

export function buildPriceList(variants: ProfileVariant[]): PriceList {
  const profilePerMetre: Record<string, number> = {};
  // Roughly proportional to the metal in the section (demo).
  for (const v of variants) profilePerMetre[v.id] = money(2 + v.massPerMetre * 7.5);
  return {
    currency: 'USD',
    note: DEMO_PRICE_NOTE,
    profilePerMetre,
    perCut: 1.5,
    perMachining: { 'access-counterbore': 2.25, 'access-hole': 1.75, 'end-tap': 2.5, drill: 1.25 },
  };
}
