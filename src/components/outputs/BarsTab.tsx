import { useState, type ReactNode } from 'react';
import { TriangleAlert } from 'lucide-react';
import type { VariantStockPlan } from '@/domain/analysis/types';
import type { DesignSettings } from '@/domain/design/schema';
import type { LengthUnit } from '@/domain/units';
import { StockPlanPicture } from './StockPlanPicture';
import { showLength, variantName } from './format';

export interface BarsTabProps {
  stockPlans: VariantStockPlan[];
  settings: DesignSettings;
  /** The settings the plans were computed with; defaults to `settings`. */
  pictureSettings?: DesignSettings;
  units: LengthUnit;
  /** Controls shown above the bars, such as the editor's stock settings form (default none: read-only). */
  settingsSlot?: ReactNode;
}

/** The stock plan as drawn bars per profile variant, with the counts it is judged by. */
export function BarsTab({ stockPlans, settings, pictureSettings = settings, units, settingsSlot }: BarsTabProps) {
  return (
    <div className="flex flex-col gap-4">
      {settingsSlot}
      <p className="text-xs text-ink-muted">
        Stock lengths are demo values; check your supplier's bar lengths. Legend: dark ends are end trim, red slivers are saw kerf, hatched is
        offcut, an accent outline marks an offcut long enough to keep.
      </p>
      {stockPlans.length === 0 && <p className="text-sm text-ink-muted">No profiles to cut yet.</p>}
      {stockPlans.map(({ variantId, plan }) => (
        <section key={variantId} aria-labelledby={`bars-${variantId}`} className="flex flex-col gap-1">
          <h3 id={`bars-${variantId}`} className="text-sm font-semibold text-ink">
            {variantName(variantId)}
          </h3>
          <dl className="grid grid-cols-2 gap-x-4 gap-y-0.5 text-sm sm:grid-cols-4">
            <Figure label="Bars needed" value={`${plan.barCount} bars`} />
            <Figure label="Lower bound" value={`${plan.lowerBound} bars`} />
            <Figure label="First-fit decreasing" value={`${plan.firstFitDecreasingBarCount} bars`} />
            <Figure label="Waste" value={showLength(plan.wasteLength, units)} />
          </dl>
          <p className="text-xs text-ink-muted">
            {plan.barCount === plan.lowerBound ? 'At the lower bound: no plan can use fewer bars.' : `${plan.barCount - plan.lowerBound} above the lower bound.`}{' '}
            Method: {plan.method}.
          </p>
          {plan.unplaceable.length > 0 && (
            <p className="flex items-center gap-1 text-sm text-severity-warning">
              <TriangleAlert aria-hidden="true" className="h-4 w-4" />
              Warning: {plan.unplaceable.length} {plan.unplaceable.length === 1 ? 'cut is' : 'cuts are'} longer than a usable bar (
              {plan.unplaceable.map((cut) => cut.label ?? cut.id).join(', ')}).
            </p>
          )}
          <CappedPicture variantId={variantId} plan={plan} settings={pictureSettings} units={units} />
        </section>
      ))}
    </div>
  );
}

function Figure({ label, value }: { label: string; value: string }) {
  return (
    <div className="flex flex-col">
      <dt className="text-xs text-ink-muted">{label}</dt>
      <dd className="text-right tabular-nums font-semibold">{value}</dd>
    </div>
  );
}

/** Bars drawn before a "show all" button: a 2,000-profile frame can need hundreds of bars. */
const FIRST_BARS = 40;

function CappedPicture({ variantId, plan, settings, units }: { variantId: string; plan: VariantStockPlan['plan']; settings: DesignSettings; units: LengthUnit }) {
  const [showAll, setShowAll] = useState(false);
  const capped = !showAll && plan.bars.length > FIRST_BARS;
  const shown = capped ? { ...plan, bars: plan.bars.slice(0, FIRST_BARS) } : plan;
  return (
    <>
      <StockPlanPicture variantId={variantId} plan={shown} stockLength={settings.stockLength} kerf={settings.kerf} endTrim={settings.endTrim} units={units} />
      {capped && (
        <button
          type="button"
          onClick={() => setShowAll(true)}
          className="min-h-[44px] self-start px-2 text-sm text-accent-strong underline focus-visible:outline focus-visible:outline-2 focus-visible:outline-accent"
        >
          Draw all {plan.bars.length} bars
        </button>
      )}
    </>
  );
}
