/**
 * Frame-shape queries the structure checks build on: which profiles are legs, which carry a
 * panel, and which plan directions are braced against racking. Lengths mm.
 */
import { panelAxes } from '../geometry/panelGeometry';
import { dominantAxis } from '../geometry/vectors';
import type { AnalysisContext, PanelInfo, ProfileInfo } from '../analysis/context';
import { frameLevels } from './footprint';

/** A direction component above this counts as vertical. */
const VERTICAL = 0.999;
const FLOOR_TOLERANCE_MM = 1;
/** A profile direction this far off every axis is a diagonal brace. */
const DIAGONAL = 0.05;

/** The two profiles along the panel's longer edges that carry it (its frame, or profiles under a face-mounted sheet). */
export function panelSupports(ctx: AnalysisContext, panel: PanelInfo): ProfileInfo[] {
  const { n, w, h } = panelAxes(panel.panel.rect.normal);
  const longAxis = panel.panel.rect.width >= panel.panel.rect.height ? w : h;
  let candidates: ProfileInfo[];
  if (panel.panel.mounting === 'captured' && panel.bounding.length > 0) {
    candidates = panel.bounding;
  } else {
    candidates = [];
    ctx.profileGrid.forEachNear(panel.box, (i) => candidates.push(ctx.profiles[i]), 1);
    candidates = candidates.filter((c) => dominantAxis(c.profile.direction) !== n);
  }
  const along = candidates.filter((c) => dominantAxis(c.profile.direction) === longAxis);
  const pool = along.length >= 2 ? along : candidates;
  if (pool.length <= 2) return pool;
  const across = longAxis === w ? h : w;
  const sorted = [...pool].sort((a, b) => a.startPoint[across] - b.startPoint[across]);
  return [sorted[0], sorted[sorted.length - 1]];
}

/** Vertical profiles whose lower end stands at the lowest level of the frame. */
export function findLegs(ctx: AnalysisContext): ProfileInfo[] {
  const { floor } = frameLevels(ctx);
  const legs: ProfileInfo[] = [];
  const profiles = ctx.profiles;
  for (let i = 0; i < profiles.length; i++) {
    const p = profiles[i];
    if (Math.abs(p.profile.direction[1]) < VERTICAL) continue;
    const bottom = Math.min(p.startPoint[1], p.endPoint[1]);
    if (bottom - floor <= FLOOR_TOLERANCE_MM + Math.max(p.width, p.height) / 2) legs.push(p);
  }
  return legs;
}

/**
 * Which plan directions have something against racking: a diagonal profile, a gusset-plate joint
 * or a panel in a vertical plane along that direction.
 */
export function frameBracing(ctx: AnalysisContext): { x: boolean; z: boolean } {
  let x = false;
  let z = false;
  const profiles = ctx.profiles;
  for (let i = 0; i < profiles.length; i++) {
    const d = profiles[i].profile.direction;
    // Counted, not filtered into a list: one array per profile adds up at 8,000 profiles.
    const offAxis = (Math.abs(d[0]) > DIAGONAL ? 1 : 0) + (Math.abs(d[1]) > DIAGONAL ? 1 : 0) + (Math.abs(d[2]) > DIAGONAL ? 1 : 0) >= 2;
    if (!offAxis || Math.abs(d[1]) <= DIAGONAL) continue;
    if (Math.abs(d[0]) > DIAGONAL) x = true;
    if (Math.abs(d[2]) > DIAGONAL) z = true;
  }
  // Index loops: this runs once per analysis, often before the engine optimises it, and an
  // unoptimised for…of makes a result object per joint.
  const joints = ctx.design.joints;
  for (let j = 0; j < joints.length; j++) {
    const joint = joints[j];
    if (joint.kind !== 'gusset-plate') continue;
    const axes = joint.members.map((m) => ctx.profileById.get(m.profileId)).filter((i): i is ProfileInfo => !!i).map((i) => dominantAxis(i.profile.direction));
    if (!axes.includes(1)) continue;
    if (axes.includes(0)) x = true;
    if (axes.includes(2)) z = true;
  }
  const panels = ctx.panels;
  for (let k = 0; k < panels.length; k++) {
    const n = panels[k].panel.rect.normal;
    if (n === 'z') x = true;
    if (n === 'x') z = true;
  }
  return { x, z };
}
