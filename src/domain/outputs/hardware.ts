/**
 * Hardware a design uses, totalled per catalogue part: connectors, screws and T-nuts counted from
 * the joints (per connector spec, times the joint's quantity), and accessories with the screws
 * and T-nuts that mount them. Also the hardware's mass moments for the centre of mass.
 * Shared by the BOM, tools, mass and cost; one pass, no per-screw objects.
 */
import type { BomCategory } from '../analysis/types';
import { jointRecipe, type JointRecipeItem } from '../design/jointHardware';
import { accessoryInfo, memberInfo, memberPoint, type AnalysisContext } from '../analysis/context';
import { pointAlongProfile } from '../geometry/profileGeometry';
import type { Vec3 } from '../geometry/vectors';

export interface HardwareLine {
  category: BomCategory;
  /** Catalogue id. */
  partId: string;
  partCode: string;
  description: string;
  unit: 'pcs' | 'm';
  quantity: number;
  /** kg per unit */
  unitMass: number;
  unitPrice: number;
  /** Design parts (joints, accessories) behind the line. */
  sourceIds: string[];
}

export interface MassMoment {
  kg: number;
  /** Σ kg·x, Σ kg·y, Σ kg·z for the part with a known position. */
  mx: number;
  my: number;
  mz: number;
  /** kg of parts with no position (counted at the frame's centre of mass). */
  unplacedKg: number;
}

export interface HardwareSummary {
  lines: HardwareLine[];
  massByCategory: Map<BomCategory, MassMoment>;
}

interface PartLike {
  id: string;
  partCode: string;
  name: string;
  unitMass: number;
  price: number;
}

export function hardwareSummary(ctx: AnalysisContext): HardwareSummary {
  const lines = new Map<string, HardwareLine>();
  // Mass sums per category in typed arrays (kg, Σ kg·x, Σ kg·y, Σ kg·z, unplaced kg): adding to a
  // number field of an object can box every sum, tens of thousands of times at 8,000 profiles.
  const sums = new Map<BomCategory, Float64Array>();
  const cat = ctx.catalogue;

  const lineByPart = new Map<PartLike, HardwareLine>();
  const add = (category: BomCategory, part: PartLike, unit: 'pcs' | 'm', quantity: number, sourceId: string, at: Vec3 | null) => {
    let line = lineByPart.get(part);
    if (!line) {
      const key = `${category}|${part.id}`;
      line = lines.get(key);
      if (!line) {
        line = { category, partId: part.id, partCode: part.partCode, description: part.name, unit, quantity: 0, unitMass: part.unitMass, unitPrice: part.price, sourceIds: [] };
        lines.set(key, line);
      }
      lineByPart.set(part, line);
    }
    line.quantity += quantity;
    if (line.sourceIds[line.sourceIds.length - 1] !== sourceId) line.sourceIds.push(sourceId);
    const kg = quantity * part.unitMass;
    if (!(kg > 0)) return;
    let m = sums.get(category);
    if (!m) {
      m = new Float64Array(5);
      sums.set(category, m);
    }
    if (at) {
      m[0] += kg;
      m[1] += kg * at[0];
      m[2] += kg * at[1];
      m[3] += kg * at[2];
    } else m[4] += kg;
  };

  // Joints with the same connector, screw head, T-nut and host system use the same parts: resolve once.
  // Keyed connector → screw head → T-nut → host system in nested maps: no key string per joint.
  const recipes = new Map<unknown, Map<unknown, Map<unknown, Map<string, JointRecipeItem[]>>>>();
  const joints = ctx.design.joints;
  for (let j = 0; j < joints.length; j++) {
    const joint = joints[j];
    const first = memberInfo(ctx, j, 0);
    const host = memberInfo(ctx, j, 1) ?? first;
    const hostSystem = host?.variant?.systemId ?? ctx.design.systemId;
    let byHead = recipes.get(joint.connectorId);
    if (!byHead) recipes.set(joint.connectorId, (byHead = new Map()));
    let byNut = byHead.get(joint.fastenerHead);
    if (!byNut) byHead.set(joint.fastenerHead, (byNut = new Map()));
    let bySystem = byNut.get(joint.tNut);
    if (!bySystem) byNut.set(joint.tNut, (bySystem = new Map()));
    let recipe = bySystem.get(hostSystem);
    if (!recipe) {
      recipe = jointRecipe(cat.catalogue, joint, hostSystem);
      bySystem.set(hostSystem, recipe);
    }
    if (recipe.length === 0) continue;
    const at = first ? memberPoint(first, joint.members[0]) : null;
    for (const r of recipe) add(r.category, r.part, 'pcs', r.perConnector * joint.quantity, joint.id, at);
  }

  const accessories = ctx.design.accessories;
  for (let a = 0; a < accessories.length; a++) {
    const acc = accessories[a];
    const part = cat.accessories.get(acc.partId);
    if (!part) continue;
    const at = accessoryPosition(ctx, acc, a);
    const category: BomCategory = acc.kind === 'gasket' ? 'gasket' : acc.kind === 'slot-cover' ? 'slot-cover' : 'accessory';
    if (part.soldBy === 'metre') {
      add(category, part, 'm', ((acc.length ?? lengthFallback(ctx, acc, a)) / 1000) * acc.quantity, acc.id, at);
    } else {
      add(category, part, 'pcs', acc.quantity, acc.id, at);
    }
    for (const use of part.fasteners ?? []) {
      const f = cat.fasteners.get(use.fastenerId);
      if (f) add('fastener', f, 'pcs', use.quantity * acc.quantity, acc.id, at);
    }
    if ((part.tNutCount ?? 0) > 0) {
      const nut = cat.tNutsBySystemKind.get(`${part.systemIds[0]}|drop-in`);
      if (nut) add('t-nut', nut, 'pcs', (part.tNutCount ?? 0) * acc.quantity, acc.id, at);
    }
  }
  const massByCategory = new Map<BomCategory, MassMoment>();
  for (const [category, m] of sums) massByCategory.set(category, { kg: m[0], mx: m[1], my: m[2], mz: m[3], unplacedKg: m[4] });
  return { lines: [...lines.values()], massByCategory };
}

/** Sold-by-length parts without a length: the profile's length, or the panel's perimeter. */
function lengthFallback(ctx: AnalysisContext, acc: { profileId?: string; panelId?: string }, accessoryIndex: number): number {
  if (acc.profileId) return accessoryInfo(ctx, accessoryIndex)?.profile.length ?? 0;
  if (acc.panelId) {
    const p = ctx.panelById.get(acc.panelId);
    if (p) return 2 * (p.sheetWidth + p.sheetHeight);
  }
  return 0;
}

/** Where accessory `acc` (`design.accessories[accessoryIndex]`) sits, mm; null when it has no place. */
function accessoryPosition(ctx: AnalysisContext, acc: { profileId?: string; panelId?: string; end?: 'start' | 'end'; along?: number }, accessoryIndex: number): Vec3 | null {
  if (acc.profileId) {
    const info = accessoryInfo(ctx, accessoryIndex);
    if (!info) return null;
    if (acc.end) return acc.end === 'start' ? info.startPoint : info.endPoint;
    return pointAlongProfile(info.profile, acc.along ?? info.profile.length / 2);
  }
  if (acc.panelId) {
    const c = ctx.panelById.get(acc.panelId)?.panel.rect.center;
    return c ? [c[0], c[1], c[2]] : null;
  }
  return null;
}
