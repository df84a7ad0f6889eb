/**
 * Interference: no two solid parts (profiles, panels) overlap by more than 0.2 mm. Broad phase on
 * a uniform grid of bounding boxes; narrow phase on the exact boxes (profiles are axis-aligned).
 * Parts of one joint, and a captured panel with its frame, are contacts, not collisions.
 * `interferenceFindingsAllPairs` is the O(n²) reference the grid is measured and tested against.
 */
import type { Finding } from '../analysis/types';
import { boxPenetration, type Box } from '../geometry/box';
import { UniformGrid } from '../geometry/spatialGrid';
import { INTERFERENCE_TOLERANCE_MM, areJoined, type AnalysisContext } from '../analysis/context';
import { capitalise, findingId, mm, panelName, profileName } from '../analysis/describe';
import { MAX_COUNTED_FINDINGS, MAX_FINDINGS_PER_CHECK, moreFindingsFinding } from './findingCap';

const CHECK = 'interference';

interface Solid {
  id: string;
  kind: 'profile' | 'panel';
  box: Box;
  /** For captured panels: the frame profiles it sits in. */
  frame?: ReadonlySet<string>;
}

function solidsOf(ctx: AnalysisContext): Solid[] {
  const solids: Solid[] = ctx.profiles.map((p) => ({ id: p.profile.id, kind: 'profile', box: p.box }));
  for (const p of ctx.panels) {
    solids.push({ id: p.panel.id, kind: 'panel', box: p.box, frame: new Set(p.panel.boundedBy ?? []) });
  }
  return solids;
}

function isContact(ctx: AnalysisContext, a: Solid, b: Solid): boolean {
  if (a.kind === 'profile' && b.kind === 'profile') return areJoined(ctx, a.id, b.id);
  if (a.frame?.has(b.id) || b.frame?.has(a.id)) return true;
  return false;
}

/** Overlaps found beyond the cap: counted, with no message built (2,000 stacked profiles make 2 million). */
interface Overflow {
  omitted: number;
}

/** Returns true when counting should stop (enough unlisted overlaps to say "at least"). */
function narrowPhase(ctx: AnalysisContext, a: Solid, b: Solid, out: Finding[], overflow: Overflow): boolean {
  const depth = boxPenetration(a.box, b.box);
  if (depth <= INTERFERENCE_TOLERANCE_MM || isContact(ctx, a, b)) return false;
  if (out.length >= MAX_FINDINGS_PER_CHECK) {
    overflow.omitted += 1;
    return overflow.omitted >= MAX_COUNTED_FINDINGS;
  }
  const [first, second] = a.id < b.id ? [a, b] : [b, a];
  out.push({
    id: findingId(CHECK, 'overlap', [first.id, second.id]),
    check: CHECK,
    severity: 'error',
    partIds: [first.id, second.id],
    message: `${describe(ctx, first)} and ${describe(ctx, second)} overlap by ${mm(depth)}. Move one of them or shorten it.`,
    data: { overlapMm: Math.round(depth * 100) / 100 },
  });
  return false;
}

function describe(ctx: AnalysisContext, s: Solid): string {
  if (s.kind === 'panel') return capitalise(panelName(ctx.panelById.get(s.id)?.panel));
  const text = profileName(ctx.profileById.get(s.id), s.id);
  return text.charAt(0).toUpperCase() + text.slice(1);
}

function sortFindings(out: Finding[], overflow: Overflow): Finding[] {
  out.sort((x, y) => (x.id < y.id ? -1 : x.id > y.id ? 1 : 0));
  if (overflow.omitted > 0) out.push(moreFindingsFinding(CHECK, 'error', overflow.omitted, overflow.omitted >= MAX_COUNTED_FINDINGS));
  return out;
}

/** Grid broad phase: O(n) for frames whose parts are spread out, as T-slot frames are. */
export function interferenceFindings(ctx: AnalysisContext): Finding[] {
  // The shared profile grid covers profile-profile pairs; without panels nothing else is needed.
  if (ctx.panels.length === 0) {
    const solids = solidsOf(ctx);
    const out: Finding[] = [];
    const overflow: Overflow = { omitted: 0 };
    ctx.profileGrid.forEachNearPair((i, j) => narrowPhase(ctx, solids[i], solids[j], out, overflow));
    return sortFindings(out, overflow);
  }
  const fast = withPanelsOnSharedGrid(ctx);
  return fast ?? withPanelsOnOneGrid(ctx);
}

/**
 * Profiles against profiles on the shared profile grid, panels against profiles by a query of
 * that grid, panels against panels on a small grid of their own: no solid per profile and no
 * second grid over every profile. Null when the list is capped: which overlaps are listed then
 * depends on the visiting order, so the caller repeats the check in the one-grid order.
 */
function withPanelsOnSharedGrid(ctx: AnalysisContext): Finding[] | null {
  const out: Finding[] = [];
  const overflow: Overflow = { omitted: 0 };
  const profiles = ctx.profiles;
  const panels = ctx.panels;
  const profileSolid = (i: number): Solid => ({ id: profiles[i].profile.id, kind: 'profile', box: profiles[i].box });
  // Captured panels sit in their frame's slots, so most panels meet a few profiles: one solid each.
  const panelSolids = new Array<Solid | undefined>(panels.length);
  const panelSolid = (k: number): Solid =>
    (panelSolids[k] ??= { id: panels[k].panel.id, kind: 'panel', box: panels[k].box, frame: new Set(panels[k].panel.boundedBy ?? []) });
  // Solids are built only for boxes that interpenetrate beyond the tolerance (the narrow phase's first test).
  const grid = ctx.profileGrid;
  grid.forEachNearPair((i, j) => {
    if (grid.penetration(i, j) <= INTERFERENCE_TOLERANCE_MM) return false;
    return narrowPhase(ctx, profileSolid(i), profileSolid(j), out, overflow);
  });
  if (overflow.omitted > 0 || out.length >= MAX_FINDINGS_PER_CHECK) return null;
  // A captured panel sits in its own frame's slots: those profiles are contacts (as `isContact`
  // finds), so they are passed over before any solid is made for the pair.
  let panel = 0;
  let box: Box = ctx.profileGrid.bounds();
  let frame: readonly string[] = [];
  const visitProfile = (i: number): boolean => {
    if (grid.penetrationWith(i, box) <= INTERFERENCE_TOLERANCE_MM) return false;
    if (frame.length > 0 && frame.includes(profiles[i].profile.id)) return false;
    return narrowPhase(ctx, profileSolid(i), panelSolid(panel), out, overflow);
  };
  for (panel = 0; panel < panels.length; panel++) {
    box = panels[panel].box;
    frame = panels[panel].panel.boundedBy ?? [];
    grid.forEachNear(box, visitProfile);
    if (overflow.omitted > 0) return null;
  }
  const panelBoxes = new Array<Box>(panels.length);
  for (let k = 0; k < panels.length; k++) panelBoxes[k] = panels[k].box;
  new UniformGrid(panelBoxes).forEachNearPair((a, b) => {
    if (boxPenetration(panelBoxes[a], panelBoxes[b]) <= INTERFERENCE_TOLERANCE_MM) return false;
    return narrowPhase(ctx, panelSolid(a), panelSolid(b), out, overflow);
  });
  if (overflow.omitted > 0) return null;
  return sortFindings(out, overflow);
}

/** Every solid on one new grid: the order that decides which overlaps a capped list shows. */
function withPanelsOnOneGrid(ctx: AnalysisContext): Finding[] {
  const solids = solidsOf(ctx);
  const out: Finding[] = [];
  const overflow: Overflow = { omitted: 0 };
  const grid = new UniformGrid(solids.map((s) => s.box));
  grid.forEachNearPair((i, j) => narrowPhase(ctx, solids[i], solids[j], out, overflow));
  return sortFindings(out, overflow);
}

/** Reference check over all pairs, O(n²): for tests and the benchmark only. */
export function interferenceFindingsAllPairs(ctx: AnalysisContext): Finding[] {
  const solids = solidsOf(ctx);
  const out: Finding[] = [];
  const overflow: Overflow = { omitted: 0 };
  for (let i = 0; i < solids.length; i++) {
    for (let j = i + 1; j < solids.length; j++) if (narrowPhase(ctx, solids[i], solids[j], out, overflow)) return sortFindings(out, overflow);
  }
  return sortFindings(out, overflow);
}
