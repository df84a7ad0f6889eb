/**
 * Tools the build needs: hex keys for the screws used (size from the screw standard), drills for
 * the machining, taps for tapped ends, a rubber mallet for pressed-in door track, and the cutting
 * kit. Wording is Slotwise's own.
 */
import type { ToolItem } from '../analysis/types';
import { threadFor, type ScrewSize } from '../catalogue/fastenerStandards';
import type { AnalysisContext, ProfileInfo } from '../analysis/context';
import { jointByIdOf } from '../analysis/context';
import { formatNumber } from '../analysis/describe';
import type { HardwareSummary } from './hardware';

export function toolList(ctx: AnalysisContext, hardware: HardwareSummary): ToolItem[] {
  const tools: ToolItem[] = [];

  // Hex keys, one per key size and standard, naming the screws that need them.
  const keys = new Map<string, { label: string; mm: number; standard: string; screws: Set<string> }>();
  const seenFasteners = new Set<string>();
  for (const h of hardware.lines) {
    if (h.category !== 'fastener' || seenFasteners.has(h.partId)) continue;
    seenFasteners.add(h.partId);
    const f = ctx.catalogue.fasteners.get(h.partId);
    if (!f) continue;
    const key = `${f.hexKey.label}|${f.hexKey.standard}`;
    const entry = keys.get(key) ?? { label: f.hexKey.label, mm: f.hexKey.mm, standard: f.hexKey.standard, screws: new Set<string>() };
    entry.screws.add(`${f.head} head ${f.thread}`);
    keys.set(key, entry);
  }
  for (const k of [...keys.values()].sort((a, b) => a.mm - b.mm)) {
    tools.push({
      id: `hex-key-${k.label.replace(/[^A-Za-z0-9]+/g, '-')}-${k.standard.replace(/[^A-Za-z0-9]+/g, '-')}`,
      kind: 'hex-key',
      name: `Hex key ${k.label}`,
      size: k.label,
      standard: k.standard,
      reason: `For the ${[...k.screws].sort().join(', ')} screws (key size from ${k.standard}).`,
    });
  }

  // Drills and taps for shop machining.
  const drills = new Map<number, Set<string>>();
  const taps = new Map<string, { drill: number | null; count: number }>();
  // The tap entry of the last system seen: every end tap of a system counts on the same entry, so
  // the thread is looked up (a new object) and the entry found once per run of one system.
  let tapSystem: ProfileInfo['system'] | null = null;
  let tapEntry: { drill: number | null; count: number } | undefined;
  const profiles = ctx.profiles;
  for (let p = 0; p < profiles.length; p++) {
    const info = profiles[p];
    const machining = info.profile.machining;
    for (let k = 0; k < machining.length; k++) {
      const m = machining[k];
      if (m.kind === 'end-tap') {
        if (info.system !== tapSystem || tapSystem === null) {
          tapSystem = info.system;
          const size = info.system?.endTapSize as ScrewSize | undefined;
          tapEntry = undefined;
          if (size) {
            const designation = threadFor(size).designation;
            tapEntry = taps.get(designation);
            if (!tapEntry) taps.set(designation, (tapEntry = { drill: info.system?.centreBoreDiameter ?? null, count: 0 }));
          }
        }
        if (tapEntry) tapEntry.count += 1;
        continue;
      }
      const diameter = m.diameter ?? defaultDiameter(ctx, m.jointId, m.kind);
      if (!diameter) continue;
      const uses = drills.get(diameter) ?? new Set<string>();
      uses.add(m.kind === 'access-counterbore' ? 'access counterbores' : m.kind === 'access-hole' ? 'access holes' : 'drilled holes');
      drills.set(diameter, uses);
    }
  }
  for (const [diameter, uses] of [...drills.entries()].sort((a, b) => a[0] - b[0])) {
    tools.push({
      id: `drill-${formatNumber(diameter)}`,
      kind: 'drill',
      name: `Drill bit Ø ${formatNumber(diameter)} mm`,
      size: `${formatNumber(diameter)} mm`,
      reason: `For the ${[...uses].sort().join(' and ')}; use a drill guide so the hole lands on the slot centre line.`,
    });
  }
  for (const [designation, t] of [...taps.entries()].sort()) {
    tools.push({
      id: `tap-${designation.replace(/[^A-Za-z0-9]+/g, '-')}`,
      kind: 'tap',
      name: `Tap ${designation}`,
      size: designation,
      reason: `For ${t.count} tapped profile ${t.count === 1 ? 'end' : 'ends'}; the centre bore${t.drill ? ` (Ø ${formatNumber(t.drill)} mm)` : ''} is already the tap drill size. Use cutting fluid for aluminium.`,
    });
  }

  if (ctx.design.accessories.some((a) => a.kind === 'door-track')) {
    tools.push({
      id: 'rubber-mallet',
      kind: 'mallet',
      name: 'Rubber mallet',
      reason: 'To press the sliding door track into its slot without marking the profile.',
    });
  }
  if (ctx.profiles.length > 0) {
    tools.push({
      id: 'square',
      kind: 'square',
      name: 'Engineer\u2019s square',
      reason: 'To check each joint is at a right angle before tightening the screws.',
    });
    tools.push({
      id: 'saw-and-stop-block',
      kind: 'saw',
      name: 'Saw with a non-ferrous blade, and a stop block',
      reason: `For cutting the ${ctx.profiles.length} profile ${ctx.profiles.length === 1 ? 'piece' : 'pieces'}: set a stop block for repeated lengths, clamp the profile, and wear eye and hearing protection. Skip it if the supplier cuts to length.`,
    });
  }
  return tools;
}

function defaultDiameter(ctx: AnalysisContext, jointId: string | undefined, kind: string): number | null {
  if (!jointId) return null;
  const joint = jointByIdOf(ctx).get(jointId);
  const connector = joint ? ctx.catalogue.connectors.get(joint.connectorId) : undefined;
  return connector?.machining.find((m) => m.kind === kind)?.diameter ?? null;
}
