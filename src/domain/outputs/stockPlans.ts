/**
 * Stock plans per profile variant, with stock settings per profile system. Lengths mm, costs in the
 * price list's currency (demo prices).
 *
 * - Settings: `settings.stockBySystem[systemId]` when given; otherwise the system's own bar
 *   lengths (its demo bar and a half bar, priced from the demo price per metre). The design-wide
 *   `stockLength` applies to the design's own system when it was changed from the 3,000 mm default.
 * - End trim is per bar end and each trimmed end costs one kerf: usable = L − Σ(trim + kerf).
 * - Offcuts on hand are used first (best fit, longest cut first).
 * - New bars: the cheapest single bar length, then each bar swapped for the cheapest length that
 *   still holds its cuts, giving the cheapest mix found. The lower bound on cost is the total cut
 *   length (with kerfs) at the cheapest price per usable millimetre.
 */
import type { VariantStockPlan } from '../analysis/types';
import type { AnalysisContext } from '../analysis/context';
import type { ProfileSystem } from '../catalogue/types';
import type { DesignDocument, SystemStock } from '../design/schema';
import { planStock, sortCutsForPacking, type StockBar, type StockCut } from './stockPlan';

/** Price of a half bar per metre against a full one: short bars cost more per metre (demo assumption, invented). */
const HALF_BAR_PRICE_FACTOR = 1.15;
const DEFAULT_STOCK_LENGTH = 3000;
const TOLERANCE = 1e-6;

/** Usable length of a bar, mm, with each trimmed end costing its trim and a kerf. */
export function usableLength(length: number, s: Pick<SystemStock, 'kerf' | 'trimStart' | 'trimEnd'>): number {
  return length - trimAllowance(s);
}

/** Total taken off a bar's two ends, mm: each trimmed end loses the trim plus one kerf. */
export function trimAllowance(s: Pick<SystemStock, 'kerf' | 'trimStart' | 'trimEnd'>): number {
  return (s.trimStart > 0 ? s.trimStart + s.kerf : 0) + (s.trimEnd > 0 ? s.trimEnd + s.kerf : 0);
}

/** The stock settings in force for one system of a design. */
export function stockSettingsFor(design: DesignDocument, system: ProfileSystem | undefined, pricePerMetre: number): SystemStock {
  const systemId = system?.id ?? design.systemId;
  const own = design.settings.stockBySystem?.[systemId];
  if (own) return own;
  const s = design.settings;
  const base = { kerf: s.kerf, trimStart: s.endTrim, trimEnd: s.endTrim, minReusableOffcut: s.minReusableOffcut };
  if (systemId === design.systemId && s.stockLength !== DEFAULT_STOCK_LENGTH) {
    return { ...base, bars: [{ length: s.stockLength, cost: round((s.stockLength / 1000) * pricePerMetre) }] };
  }
  const full = system?.demoStockLength ?? DEFAULT_STOCK_LENGTH;
  const half = Math.round(full / 2);
  return {
    ...base,
    bars: [
      { length: full, cost: round((full / 1000) * pricePerMetre) },
      { length: half, cost: round((half / 1000) * pricePerMetre * HALF_BAR_PRICE_FACTOR) },
    ],
  };
}

export interface OffcutUse {
  /** mm */
  length: number;
  cuts: StockCut[];
  /** mm left of the offcut */
  left: number;
}

/** Cuts placed in offcuts on hand (best fit, longest cut first), and the cuts still to place. */
export function useOffcuts(cuts: StockCut[], offcuts: number[], kerf: number): { used: OffcutUse[]; rest: StockCut[] } {
  // No offcuts on hand (the usual case): every cut is left, longest first.
  if (offcuts.length === 0) return { used: [], rest: longestFirst(cuts) };
  const bins = offcuts.map((length) => ({ length, space: length + kerf, cuts: [] as StockCut[] }));
  const rest: StockCut[] = [];
  // Index loops: an iterator per cut was most of what this allocated at 8,000 profiles.
  const ordered = longestFirst(cuts);
  for (let c = 0; c < ordered.length; c++) {
    const cut = ordered[c];
    let best: (typeof bins)[number] | null = null;
    for (let b = 0; b < bins.length; b++) {
      const bin = bins[b];
      if (bin.space + TOLERANCE >= cut.length + kerf && (!best || bin.space < best.space)) best = bin;
    }
    if (!best) rest.push(cut);
    else {
      best.cuts.push(cut);
      best.space -= cut.length + kerf;
    }
  }
  const used = bins.filter((b) => b.cuts.length > 0).map((b) => ({ length: b.length, cuts: b.cuts, left: Math.max(0, round(b.space - kerf)) }));
  return { used, rest };
}

/**
 * The cuts longest first, equal lengths in their given order: what the stable
 * `[...cuts].sort((a, b) => b.length - a.length)` gives. Frames repeat a few lengths, so the cuts
 * are bucketed by length and only the distinct lengths are sorted (falls back to the sort when a
 * length is not a finite number, where that comparison is not an order).
 */
function longestFirst(cuts: readonly StockCut[]): StockCut[] {
  // Each cut's length slot (lengths in order of first appearance) and the count per slot; a frame
  // repeats a few lengths, so the last slot is tried before the map.
  const slotByLength = new Map<number, number>();
  const lengths: number[] = [];
  const counts: number[] = [];
  const slotOf = new Int32Array(cuts.length);
  let lastLength = Number.NaN;
  let lastSlot = -1;
  for (let c = 0; c < cuts.length; c++) {
    const length = cuts[c].length;
    if (!Number.isFinite(length)) return [...cuts].sort((a, b) => b.length - a.length);
    let slot = length === lastLength ? lastSlot : slotByLength.get(length);
    if (slot === undefined) {
      slot = lengths.length;
      slotByLength.set(length, slot);
      lengths.push(length);
      counts.push(0);
    }
    counts[slot]++;
    slotOf[c] = slot;
    lastLength = length;
    lastSlot = slot;
  }
  // Slots longest first (a stable sort of distinct lengths), then each slot's first place in the list.
  const order = lengths.map((_, slot) => slot).sort((a, b) => lengths[b] - lengths[a]);
  const next = new Int32Array(lengths.length);
  let at = 0;
  for (const slot of order) {
    next[slot] = at;
    at += counts[slot];
  }
  // Filled at its final length, by index (no bucket lists, no iterator or growth per cut).
  const sorted = new Array<StockCut>(cuts.length);
  for (let c = 0; c < cuts.length; c++) sorted[next[slotOf[c]]++] = cuts[c];
  return sorted;
}

function barHolds(bar: StockBar, usable: number, kerf: number): boolean {
  const total = bar.cuts.reduce((s, c) => s + c.length, 0) + Math.max(0, bar.cuts.length - 1) * kerf;
  return total <= usable + TOLERANCE;
}

export function stockPlans(ctx: AnalysisContext): VariantStockPlan[] {
  const byVariant = new Map<string, StockCut[]>();
  // Frames list many profiles of one variant in a row: the last list is reused without a look-up.
  let lastVariant: string | undefined;
  let list: StockCut[] = [];
  const profiles = ctx.profiles;
  for (let p = 0; p < profiles.length; p++) {
    // Written out rather than spread: a spread object is built by a slow generic copy, 8,000 times.
    const { id, length, label, variantId } = profiles[p].profile;
    if (variantId !== lastVariant || lastVariant === undefined) {
      const known = byVariant.get(variantId);
      if (known) list = known;
      else byVariant.set(variantId, (list = []));
      lastVariant = variantId;
    }
    list.push(label ? { id, length, label } : { id, length });
  }
  const prices = ctx.catalogue.catalogue.prices.profilePerMetre;
  return [...byVariant.entries()]
    .sort((a, b) => (a[0] < b[0] ? -1 : 1))
    .map(([variantId, cuts]) => {
      const variant = ctx.catalogue.variants.get(variantId);
      const system = variant ? ctx.catalogue.systems.get(variant.systemId) : undefined;
      const settings = stockSettingsFor(ctx.design, system, prices[variantId] ?? 0);
      const offcuts = (ctx.design.settings.offcutsOnHand ?? []).filter((o) => o.variantId === variantId).flatMap((o) => Array.from({ length: o.quantity }, () => o.length));
      return planVariant(variantId, system?.id ?? ctx.design.systemId, cuts, settings, offcuts);
    });
}

/** One variant's plan: offcuts first, then the cheapest mix of bar lengths. */
export function planVariant(variantId: string, systemId: string, cuts: StockCut[], settings: SystemStock, offcuts: number[] = []): VariantStockPlan {
  const { used, rest } = useOffcuts(cuts, offcuts, settings.kerf);
  const trim = trimAllowance(settings);
  const options = [...settings.bars].sort((a, b) => b.length - a.length);
  // One sort of the cuts for every bar length tried (the order needs finite lengths).
  const sortedCuts = rest.every((cut) => Number.isFinite(cut.length)) ? sortCutsForPacking(rest) : undefined;
  let best: { plan: ReturnType<typeof planStock>; bars: { length: number; cost: number }[]; cost: number } | null = null;
  // Every bar is bought at a length no dearer than the plan's own, so no bar costs less than the
  // cheapest length on offer: a plan for another bar length costs at least its fewest possible bars
  // at that price (plus its unplaceable cuts). When that bound already loses to the best plan, the
  // plan could never be chosen and is not made.
  // (Only with prices that are numbers of at least 0, where more bars never cost less.)
  let cheapestBar = Infinity;
  for (const o of options) cheapestBar = o.cost >= 0 && cheapestBar >= 0 ? Math.min(cheapestBar, o.cost) : Number.NaN;
  for (const option of options) {
    if (option.length - trim <= 0) continue;
    if (best && cheapestBar >= 0 && planCostFloor(rest, option.length - trim, settings.kerf, cheapestBar) > best.cost + COST_MARGIN) continue;
    const plan = planStock({ cuts: rest, stockLength: option.length, kerf: settings.kerf, endTrim: trim, minReusableOffcut: settings.minReusableOffcut, sortedCuts });
    // Each bar bought in the cheapest length that still holds its cuts.
    const bars = plan.bars.map((bar) => {
      let pick = option;
      for (const o of options) if (o.cost < pick.cost && barHolds(bar, o.length - trim, settings.kerf)) pick = o;
      return pick;
    });
    const unplaced = plan.unplaceable.length;
    const cost = bars.reduce((s, b) => s + b.cost, 0) + unplaced * 1e9;
    if (!best || cost < best.cost - TOLERANCE) best = { plan, bars, cost };
  }
  const plan = best?.plan ?? planStock({ cuts: rest, stockLength: options[0].length, kerf: settings.kerf, endTrim: trim, minReusableOffcut: settings.minReusableOffcut, sortedCuts });
  const bars = best?.bars ?? [];
  // Recompute offcuts for bars bought shorter than the plan's length.
  const adjusted = plan.bars.map((bar, i) => {
    const usable = (bars[i]?.length ?? options[0].length) - trim;
    const offcut = Math.max(0, round(usable - bar.usedLength));
    // Written out (the fields in the order a spread of the bar gives), not spread per bar.
    return { index: bar.index, cuts: bar.cuts, usedLength: bar.usedLength, offcut, reusable: offcut >= settings.minReusableOffcut && offcut > 0 };
  });
  const need = rest.reduce((s, c) => s + c.length + settings.kerf, 0);
  const cheapestPerMm = Math.min(...options.filter((o) => o.length - trim > 0).map((o) => o.cost / (o.length - trim + settings.kerf)));
  return {
    variantId,
    systemId,
    plan: { ...plan, bars: adjusted },
    settings,
    barStock: bars,
    offcutsUsed: used,
    cost: round(bars.reduce((s, b) => s + b.cost, 0)),
    costLowerBound: round(Number.isFinite(cheapestPerMm) ? need * cheapestPerMm : 0),
  };
}

/** Slack when a cost bound is compared with a summed cost (the sums add thousands of prices). */
const COST_MARGIN = 1e-3;

/**
 * No plan of `cuts` into bars of `usable` mm costs less than this: the fewest bars that can hold the
 * cuts that fit (each cut takes its length plus a kerf of the usable length plus one kerf, as in
 * `planStock`'s lower bound, with the packing's length tolerance allowed per bar) at `barCost`
 * each, plus the penalty per cut too long for the bar.
 */
function planCostFloor(cuts: readonly StockCut[], usable: number, kerf: number, barCost: number): number {
  const k = Math.max(0, kerf);
  let total = 0;
  let unplaceable = 0;
  for (let c = 0; c < cuts.length; c++) {
    const length = cuts[c].length;
    if (Number.isFinite(length) && length > 0 && length <= usable + TOLERANCE) total += length + k;
    else unplaceable++;
  }
  const bars = total > 0 ? Math.ceil(total / (usable + k + 2 * TOLERANCE) - 1e-6) : 0;
  return bars * barCost + unplaceable * 1e9;
}

function round(v: number): number {
  return Math.round(v * 100) / 100;
}
