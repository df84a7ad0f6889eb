import { Trash2 } from 'lucide-react';
import type { MemberResult, StructureResult } from '@/domain/analysis/types';
import type { LoadCase } from '@/domain/design/schema';
import type { LengthUnit } from '@/domain/units';
import { BeamSketch } from './BeamSketch';
import type { SketchLoad } from './deflectedShape';
import { Verdict } from './severity';
import { showForce, showLength, showSmallLength, showStress } from '@/components/outputs/format';

/** The member closest to (or furthest past) its limits governs the picture. */
export function governingMember(members: MemberResult[]): MemberResult | null {
  let best: MemberResult | null = null;
  let bestRatio = -Infinity;
  for (const member of members) {
    const ratio = Math.max(member.maxDeflection / Math.max(member.deflectionLimit, 1e-9), member.maxStress / Math.max(member.allowableStress, 1e-9));
    if (ratio > bestRatio) {
      best = member;
      bestRatio = ratio;
    }
  }
  return best;
}

function sketchLoadFor(loadCase: LoadCase, member: MemberResult): SketchLoad {
  const point = loadCase.loads.find((load) => load.kind === 'point' && load.profileId === member.profileId);
  if (point && point.kind === 'point') return { kind: 'point', at: Math.min(point.along, member.span) };
  if (member.beamCase.includes('point')) return { kind: 'point', at: member.span / 2 };
  return { kind: 'uniform' };
}

export interface LoadCaseResultProps {
  loadCase: LoadCase;
  result: StructureResult | undefined;
  units: LengthUnit;
  /** From design.settings: the limits are stated with the numbers actually used. */
  safetyFactor: number;
  onRemove: () => void;
}

export function LoadCaseResult({ loadCase, result, units, safetyFactor, onRemove }: LoadCaseResultProps) {
  const member = result ? governingMember(result.members) : null;
  const worstLeg = result?.legs.reduce<StructureResult['legs'][number] | null>((worst, leg) => (!worst || leg.utilisation > worst.utilisation ? leg : worst), null) ?? null;
  return (
    <article aria-label={`Load case ${loadCase.name}`} className="flex flex-col gap-2 rounded border border-paper-line bg-paper-raised p-3">
      <header className="flex items-center justify-between gap-2">
        <h3 className="text-sm font-semibold">{loadCase.name}</h3>
        <button type="button" onClick={onRemove} className="inline-flex min-h-[44px] items-center gap-1 rounded px-2 text-sm text-ink-soft hover:bg-paper-sunk focus-visible:outline focus-visible:outline-2 focus-visible:outline-accent">
          <Trash2 aria-hidden="true" className="h-4 w-4" />
          Remove
        </button>
      </header>
      {!result && <p className="text-sm text-ink-muted">Waiting for the analysis of this case…</p>}
      {result && member && (
        <BeamSketch
          span={member.span}
          support={member.support}
          load={sketchLoadFor(loadCase, member)}
          maxDeflection={member.maxDeflection}
          forceLabel={showForce(member.load, units)}
          units={units}
        />
      )}
      {result && (
        <table className="w-full text-sm">
          <caption className="sr-only">Results for {loadCase.name}</caption>
          <thead>
            <tr className="border-b border-paper-line text-ink-soft">
              <th scope="col" className="px-2 py-1 text-left font-medium">Estimate</th>
              <th scope="col" className="px-2 py-1 text-right font-medium">Value</th>
              <th scope="col" className="px-2 py-1 text-right font-medium">Limit</th>
              <th scope="col" className="px-2 py-1 text-left font-medium">Verdict</th>
            </tr>
          </thead>
          <tbody>
            {member && (
              <>
                <tr className="border-b border-paper-line/60">
                  <th scope="row" className="px-2 py-1 text-left font-normal">Deflection of {member.profileId}</th>
                  <td className="px-2 py-1 text-right tabular-nums">{showSmallLength(member.maxDeflection, units)}</td>
                  <td className="px-2 py-1 text-right tabular-nums">{showSmallLength(member.deflectionLimit, units)} (span/{Math.round(member.span / member.deflectionLimit)})</td>
                  <td className="px-2 py-1"><Verdict ok={member.deflectionOk} /></td>
                </tr>
                <tr className="border-b border-paper-line/60">
                  <th scope="row" className="px-2 py-1 text-left font-normal">Bending stress</th>
                  <td className="px-2 py-1 text-right tabular-nums">{showStress(member.maxStress, units)}</td>
                  <td className="px-2 py-1 text-right tabular-nums">{showStress(member.allowableStress, units)} (yield/{safetyFactor.toFixed(1)})</td>
                  <td className="px-2 py-1"><Verdict ok={member.stressOk} /></td>
                </tr>
              </>
            )}
            {result.members.length === 0 && (
              <tr><td colSpan={4} className="px-2 py-1 text-ink-muted">No loaded member found for this case.</td></tr>
            )}
            {worstLeg && (
              <tr className="border-b border-paper-line/60">
                <th scope="row" className="px-2 py-1 text-left font-normal">Leg buckling ({worstLeg.profileId}, K {worstLeg.effectiveLengthFactor})</th>
                <td className="px-2 py-1 text-right tabular-nums">{(worstLeg.utilisation * 100).toFixed(1)} % of {showForce(worstLeg.bucklingLoad, units)}</td>
                <td className="px-2 py-1 text-right tabular-nums">100 %</td>
                <td className="px-2 py-1"><Verdict ok={worstLeg.ok} /></td>
              </tr>
            )}
            {result.tipOver && (
              <tr className="border-b border-paper-line/60">
                <th scope="row" className="px-2 py-1 text-left font-normal">Tip-over push at {showLength(result.tipOver.pushHeight, units)}</th>
                <td className="px-2 py-1 text-right tabular-nums">{showForce(result.tipOver.force, units)}</td>
                <td className="px-2 py-1 text-right text-xs text-ink-muted">tips towards {result.tipOver.edge}</td>
                <td className="px-2 py-1 text-xs text-ink-muted">push needed to tip</td>
              </tr>
            )}
          </tbody>
        </table>
      )}
      {result && result.members.length > 1 && (
        <details className="text-xs">
          <summary className="cursor-pointer">All {result.members.length} loaded members</summary>
          <ul>
            {result.members.map((m) => (
              <li key={m.profileId} className="tabular-nums">
                {m.profileId}: {showSmallLength(m.maxDeflection, units)} of {showSmallLength(m.deflectionLimit, units)}, {showStress(m.maxStress, units)} of {showStress(m.allowableStress, units)}
              </li>
            ))}
          </ul>
        </details>
      )}
    </article>
  );
}
