/**
 * Hardware a design uses, totalled per catalogue part: connectors, screws and T-nuts counted from
 * the joints (per connector spec, times the joint's quantity), and accessories with the screws
 * and T-nuts that mount them. Also the hardware's mass moments for the centre of mass.
 * Shared by the BOM, tools, mass and cost; one pass, no per-screw objects.
 */
import type { BomCategory } from '../analysis/types';
import { jointRecipe } from '../design/jointHardware';
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

/**
 * One part as a recipe lists it, resolved once: the line it adds to (found by the part, as the
 * first use made it), the category its mass counts under and that category's sums (made on the
 * first use with a mass, so the categories keep the order of their first mass).
 */
interface ResolvedItem {
  target: JointLine;
  category: BomCategory;
  unitMass: number;
  perConnector: number;
  sum: Float64Array | null;
}

/**
 * A line that joints add to, with room for its joints' source ids: at most one per joint whose
 * recipe lists it (`size`, counted before any id is written), `filled` of them written so far. The
 * list is made at that length once, not grown id by id (three lists of about 10,700 ids at 8,000
 * profiles, copied several times over as they grew).
 */
interface JointLine {
  line: HardwareLine;
  size: number;
  filled: number;
}

export function hardwareSummary(ctx: AnalysisContext): HardwareSummary {
  const lines = new Map<string, HardwareLine>();
  // Mass sums per category in typed arrays (kg, Σ kg·x, Σ kg·y, Σ kg·z, unplaced kg): adding to a
  // number field of an object can box every sum, tens of thousands of times at 8,000 profiles.
  const sums = new Map<BomCategory, Float64Array>();
  const cat = ctx.catalogue;

  const lineByPart = new Map<PartLike, HardwareLine>();
  /** The line for a part, made on its first use (one line per part, whatever the later category). */
  const lineFor = (category: BomCategory, part: PartLike, unit: 'pcs' | 'm'): HardwareLine => {
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
    return line;
  };
  const sumFor = (category: BomCategory): Float64Array => {
    let m = sums.get(category);
    if (!m) {
      m = new Float64Array(5);
      sums.set(category, m);
    }
    return m;
  };
  const addMass = (m: Float64Array, kg: number, at: Vec3 | null) => {
    if (at) {
      m[0] += kg;
      m[1] += kg * at[0];
      m[2] += kg * at[1];
      m[3] += kg * at[2];
    } else m[4] += kg;
  };
  const add = (category: BomCategory, part: PartLike, unit: 'pcs' | 'm', quantity: number, sourceId: string, at: Vec3 | null) => {
    const line = lineFor(category, part, unit);
    line.quantity += quantity;
    if (line.sourceIds[line.sourceIds.length - 1] !== sourceId) line.sourceIds.push(sourceId);
    const kg = quantity * part.unitMass;
    if (kg > 0) addMass(sumFor(category), kg, at);
  };

  // Joints with the same connector, screw head, T-nut and host system use the same parts: resolve once.
  // Keyed connector → screw head → T-nut → host system in nested maps: no key string per joint; a
  // joint like the one before it (the usual case) reuses its recipe without a look-up. First pass:
  // each joint's recipe (`recipeOf`, an index into `recipeList`) and how many joints use it.
  const recipes = new Map<unknown, Map<unknown, Map<unknown, Map<string, number>>>>();
  const recipeList: ResolvedItem[][] = [];
  const recipeUses: number[] = [];
  const jointLines = new Map<HardwareLine, JointLine>();
  const targetFor = (line: HardwareLine): JointLine => {
    let target = jointLines.get(line);
    if (!target) jointLines.set(line, (target = { line, size: 0, filled: 0 }));
    return target;
  };
  const joints = ctx.design.joints;
  const recipeOf = new Int32Array(joints.length);
  let lastConnector: unknown = undefined;
  let lastHead: unknown = undefined;
  let lastNut: unknown = undefined;
  let lastSystem: string | undefined = undefined;
  let recipe = -1;
  for (let j = 0; j < joints.length; j++) {
    const joint = joints[j];
    const host = memberInfo(ctx, j, 1) ?? memberInfo(ctx, j, 0);
    const hostSystem = host?.variant?.systemId ?? ctx.design.systemId;
    if (recipe < 0 || joint.connectorId !== lastConnector || joint.fastenerHead !== lastHead || joint.tNut !== lastNut || hostSystem !== lastSystem) {
      let byHead = recipes.get(joint.connectorId);
      if (!byHead) recipes.set(joint.connectorId, (byHead = new Map()));
      let byNut = byHead.get(joint.fastenerHead);
      if (!byNut) byHead.set(joint.fastenerHead, (byNut = new Map()));
      let bySystem = byNut.get(joint.tNut);
      if (!bySystem) byNut.set(joint.tNut, (bySystem = new Map()));
      const known = bySystem.get(hostSystem);
      if (known === undefined) {
        // Lines made here, on the recipe's first joint: the order lines were always made in.
        recipe = recipeList.length;
        recipeList.push(
          jointRecipe(cat.catalogue, joint, hostSystem).map((r) => ({ target: targetFor(lineFor(r.category, r.part, 'pcs')), category: r.category, unitMass: r.part.unitMass, perConnector: r.perConnector, sum: null })),
        );
        recipeUses.push(0);
        bySystem.set(hostSystem, recipe);
      } else recipe = known;
      lastConnector = joint.connectorId;
      lastHead = joint.fastenerHead;
      lastNut = joint.tNut;
      lastSystem = hostSystem;
    }
    recipeOf[j] = recipe;
    recipeUses[recipe]++;
  }
  for (let r = 0; r < recipeList.length; r++) for (const item of recipeList[r]) item.target.size += recipeUses[r];
  for (const target of jointLines.values()) target.line.sourceIds = new Array<string>(target.size);

  // Second pass: quantities, masses and source ids, joint by joint. A source id is written unless
  // the line's last one is the same (a part listed twice in a recipe, or joints sharing an id).
  for (let j = 0; j < joints.length; j++) {
    const items = recipeList[recipeOf[j]];
    if (items.length === 0) continue;
    const joint = joints[j];
    const first = memberInfo(ctx, j, 0);
    const at = first ? memberPoint(first, joint.members[0]) : null;
    const sourceId = joint.id;
    for (let r = 0; r < items.length; r++) {
      const item = items[r];
      const target = item.target;
      const line = target.line;
      const quantity = item.perConnector * joint.quantity;
      line.quantity += quantity;
      const ids = line.sourceIds;
      if (target.filled === 0 || ids[target.filled - 1] !== sourceId) ids[target.filled++] = sourceId;
      const kg = quantity * item.unitMass;
      if (kg > 0) addMass(item.sum ?? (item.sum = sumFor(item.category)), kg, at);
    }
  }
  // Fewer ids than room only where ids repeated.
  for (const target of jointLines.values()) if (target.filled < target.size) target.line.sourceIds.length = target.filled;

  const accessories = ctx.design.accessories;
  // The T-nut an accessory part mounts with, looked up once per part (the look-up key is a string).
  const nutByPart = new Map<PartLike, PartLike | undefined>();
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
    const fasteners = part.fasteners;
    if (fasteners) {
      for (let u = 0; u < fasteners.length; u++) {
        const use = fasteners[u];
        const f = cat.fasteners.get(use.fastenerId);
        if (f) add('fastener', f, 'pcs', use.quantity * acc.quantity, acc.id, at);
      }
    }
    if ((part.tNutCount ?? 0) > 0) {
      let nut = nutByPart.get(part);
      if (nut === undefined && !nutByPart.has(part)) nutByPart.set(part, (nut = cat.tNutsBySystemKind.get(`${part.systemIds[0]}|drop-in`)));
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
