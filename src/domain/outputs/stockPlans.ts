/** One stock plan per profile variant, from the design's stock settings (mm). */
import type { VariantStockPlan } from '../analysisTypes';
import type { AnalysisContext } from '../checks/context';
import { planStock, type StockCut } from './stockPlan';

export function stockPlans(ctx: AnalysisContext): VariantStockPlan[] {
  const byVariant = new Map<string, StockCut[]>();
  for (const info of ctx.profiles) {
    const list = byVariant.get(info.profile.variantId) ?? [];
    list.push({ id: info.profile.id, length: info.profile.length, ...(info.profile.label ? { label: info.profile.label } : {}) });
    byVariant.set(info.profile.variantId, list);
  }
  const s = ctx.design.settings;
  return [...byVariant.entries()]
    .sort((a, b) => (a[0] < b[0] ? -1 : 1))
    .map(([variantId, cuts]) => ({
      variantId,
      plan: planStock({ cuts, stockLength: s.stockLength, kerf: s.kerf, endTrim: s.endTrim, minReusableOffcut: s.minReusableOffcut }),
    }));
}
