/**
 * Profile ends: which are closed by a joint, which carry a foot, caster or end cap, and the
 * operations that cap every free end or put feet under the bottom ends.
 */
import { accessoryFor, defaultCatalogue, getAccessoryPart } from '../catalogue';
import type { Catalogue } from '../catalogue/types';
import { profileEndPoint } from '../geometry/profileGeometry';
import { createIdAllocator } from './ids';
import type { Accessory, DesignDocument, Profile, ProfileEnd } from './schema';

/** How close (mm) an end must be to the lowest end to count as a bottom end. */
export const BOTTOM_LEVEL_TOLERANCE_MM = 1;
/** A direction component above this counts as pointing straight down. */
const VERTICAL_COMPONENT = 0.999;

export interface ProfileEndRef {
  profileId: string;
  end: ProfileEnd;
}

const key = (profileId: string, end: ProfileEnd) => `${profileId}@${end}`;

/** Ends closed by a joint: a member that meets the joint with its start or end. */
export function jointedEnds(design: DesignDocument): Set<string> {
  const out = new Set<string>();
  for (const j of design.joints) for (const m of j.members) if (m.at !== 'span') out.add(key(m.profileId, m.at));
  return out;
}

/** Ends carrying an end accessory (end cap, foot, caster), mapped to the accessory. */
export function endAccessories(design: DesignDocument): Map<string, Accessory> {
  const out = new Map<string, Accessory>();
  for (const a of design.accessories) {
    if (a.profileId && a.end && (a.kind === 'end-cap' || a.kind === 'leveling-foot' || a.kind === 'caster')) {
      out.set(key(a.profileId, a.end), a);
    }
  }
  return out;
}

/** Ends neither joined nor carrying a cap, foot or caster. */
export function freeEnds(design: DesignDocument): ProfileEndRef[] {
  const joined = jointedEnds(design);
  const treated = endAccessories(design);
  const out: ProfileEndRef[] = [];
  for (const p of design.profiles) {
    for (const end of ['start', 'end'] as const) {
      const k = key(p.id, end);
      if (!joined.has(k) && !treated.has(k)) out.push({ profileId: p.id, end });
    }
  }
  return out;
}

function systemOf(design: DesignDocument, profile: Profile, catalogue: Catalogue): string {
  return catalogue.variants.find((v) => v.id === profile.variantId)?.systemId ?? design.systemId;
}

/** An end cap on every end that is neither joined nor carrying a foot or caster. */
export function autoEndCaps(design: DesignDocument, catalogue: Catalogue = defaultCatalogue): DesignDocument {
  const ids = createIdAllocator(design);
  const byId = new Map(design.profiles.map((p) => [p.id, p]));
  const caps: Accessory[] = [];
  for (const ref of freeEnds(design)) {
    const profile = byId.get(ref.profileId)!;
    const part = accessoryFor(catalogue, systemOf(design, profile, catalogue), 'end-cap');
    if (!part) continue;
    caps.push({ id: ids.next('cap'), kind: 'end-cap', partId: part.id, profileId: ref.profileId, end: ref.end, quantity: 1 });
  }
  if (caps.length === 0) return design;
  return { ...design, accessories: [...design.accessories, ...caps] };
}

/** Ends that point straight down at the lowest level of the design and are not joined. */
export function bottomEnds(design: DesignDocument): ProfileEndRef[] {
  const joined = jointedEnds(design);
  const candidates: { ref: ProfileEndRef; y: number }[] = [];
  for (const p of design.profiles) {
    for (const end of ['start', 'end'] as const) {
      const down = end === 'end' ? -p.direction[1] : p.direction[1];
      if (down < VERTICAL_COMPONENT || joined.has(key(p.id, end))) continue;
      candidates.push({ ref: { profileId: p.id, end }, y: profileEndPoint(p, end)[1] });
    }
  }
  if (candidates.length === 0) return [];
  const lowest = Math.min(...candidates.map((c) => c.y));
  return candidates.filter((c) => c.y - lowest <= BOTTOM_LEVEL_TOLERANCE_MM).map((c) => c.ref);
}

/**
 * A leveling foot (or caster) under every free bottom end, with the end tap it threads into.
 * An end cap already on such an end is replaced.
 */
export function addFeetToFreeBottomEnds(
  design: DesignDocument,
  kind: 'leveling-foot' | 'caster' = 'leveling-foot',
  catalogue: Catalogue = defaultCatalogue,
): DesignDocument {
  const ids = createIdAllocator(design);
  const treated = endAccessories(design);
  const byId = new Map(design.profiles.map((p) => [p.id, p]));
  const removeCaps = new Set<string>();
  const added: Accessory[] = [];
  const taps = new Map<string, ProfileEnd[]>();
  for (const ref of bottomEnds(design)) {
    const existing = treated.get(key(ref.profileId, ref.end));
    if (existing && existing.kind !== 'end-cap') continue;
    if (existing) removeCaps.add(existing.id);
    const profile = byId.get(ref.profileId)!;
    const part = accessoryFor(catalogue, systemOf(design, profile, catalogue), kind);
    if (!part) continue;
    added.push({ id: ids.next(kind === 'caster' ? 'caster' : 'foot'), kind, partId: part.id, profileId: ref.profileId, end: ref.end, quantity: 1 });
    taps.set(ref.profileId, [...(taps.get(ref.profileId) ?? []), ref.end]);
  }
  if (added.length === 0) return design;
  const profiles = design.profiles.map((p) => {
    const ends = taps.get(p.id);
    if (!ends) return p;
    const system = catalogue.systems.find((s) => s.id === systemOf(design, p, catalogue));
    const newTaps = ends
      .filter((end) => !p.machining.some((m) => m.kind === 'end-tap' && m.fromEnd === end))
      .map((end) => ({ id: ids.next('mc'), kind: 'end-tap' as const, fromEnd: end, offset: 0, face: 0, diameter: system?.centreBoreDiameter }));
    return newTaps.length ? { ...p, machining: [...p.machining, ...newTaps] } : p;
  });
  return {
    ...design,
    profiles,
    accessories: [...design.accessories.filter((a) => !removeCaps.has(a.id)), ...added],
  };
}

/** True when the accessory part is one that threads into a tapped end. */
export function isThreadedEndPart(catalogue: Catalogue, partId: string): boolean {
  const part = getAccessoryPart(catalogue, partId);
  return part?.threadSize !== undefined;
}
