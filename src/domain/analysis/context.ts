/**
 * Everything the checks and outputs need about a design, computed once per analysis:
 * per-profile geometry, catalogue records resolved by map, joints and end accessories by profile
 * end (index tables in `profileLinks.ts`), and a spatial index over profile boxes shared by every
 * check.
 */
import type { Accessory, DesignDocument, Joint, Panel, Profile, ProfileEnd } from '../design/schema';
import type { Connector, PanelMaterial, ProfileSystem, ProfileVariant } from '../catalogue/types';
import type { Alloy } from '../catalogue/materials';
import type { Box } from '../geometry/box';
import { panelBox, panelAxes } from '../geometry/panelGeometry';
import { pointAlongProfile, profileBoundsInto, sectionAxes, type SectionAxes } from '../geometry/profileGeometry';
import { UniformGrid, boxAt } from '../geometry/spatialGrid';
import type { Vec3 } from '../geometry/vectors';
import type { CatalogueIndex } from './catalogueIndex';
import { attachAccessories, attachJoints, jointList, NONE, type ProfileJointTables } from './profileLinks';

/** Two parts closer than this (mm) count as touching. Common practice for a drawn model, no source. */
export const CONTACT_TOLERANCE_MM = 0.5;
/** Overlap (mm) above which two solid parts collide (brief: 0.2 mm). */
export const INTERFERENCE_TOLERANCE_MM = 0.2;
/** Fallback section size when a variant is unknown, mm. */
const UNKNOWN_SECTION_MM = 40;

export interface ProfileInfo {
  index: number;
  profile: Profile;
  variant: ProfileVariant | undefined;
  system: ProfileSystem | undefined;
  width: number;
  height: number;
  axes: SectionAxes;
  /**
   * The profile's bounding box, a new object on every read (made from the shared grid's corner
   * table; loops over every profile read the grid instead: `profileGrid.minY(i)` and the like).
   */
  readonly box: Box;
  startPoint: Vec3;
  endPoint: Vec3;
  /** Joints with any member on this profile (a new list on every read; `AnalysisContext.profileJointIndex` has them as indices). */
  readonly joints: Joint[];
  /**
   * Joints with a member at the start / end (a span member within 1 mm of an end counts), a new list
   * on every read; `jointCountAt` counts them without one.
   */
  readonly startJoints: Joint[];
  readonly endJoints: Joint[];
  readonly startJointCount: number;
  readonly endJointCount: number;
  /** Accessories fitted to the start / end. */
  startAccessories: Accessory[];
  endAccessories: Accessory[];
}

/**
 * The context's `ProfileInfo`. It keeps no box object and no joint lists: 8,000 boxes (six boxed
 * numbers each) and three joint lists per profile alive through the analysis were nearly half of
 * what the young-generation collector copied of the context. Both are made on reading, from typed
 * tables the context shares.
 */
class ProfileRecord implements ProfileInfo {
  readonly index: number;
  readonly profile: Profile;
  readonly variant: ProfileVariant | undefined;
  readonly system: ProfileSystem | undefined;
  readonly width: number;
  readonly height: number;
  readonly axes: SectionAxes;
  readonly startPoint: Vec3;
  readonly endPoint: Vec3;
  startAccessories: Accessory[] = NONE;
  endAccessories: Accessory[] = NONE;
  /** Six numbers per profile (min x, y, z, max x, y, z), shared with the grid. */
  private readonly corners: Float64Array;
  private readonly jointTables: ProfileJointTables;

  constructor(
    index: number,
    profile: Profile,
    variant: ProfileVariant | undefined,
    system: ProfileSystem | undefined,
    width: number,
    height: number,
    axes: SectionAxes,
    endPoint: Vec3,
    corners: Float64Array,
    jointTables: ProfileJointTables,
  ) {
    this.index = index;
    this.profile = profile;
    this.variant = variant;
    this.system = system;
    this.width = width;
    this.height = height;
    this.axes = axes;
    // A copy, although the document's point would do: made here, every start and end point has
    // the same array layout (the document's may hold small integers), so readers of points stay
    // on one fast path.
    this.startPoint = [profile.start[0], profile.start[1], profile.start[2]];
    this.endPoint = endPoint;
    this.corners = corners;
    this.jointTables = jointTables;
  }

  get box(): Box {
    return boxAt(this.corners, this.index);
  }

  get joints(): Joint[] {
    const t = this.jointTables;
    return jointList(t.joints, t.anyStart, t.anyIndex, this.index);
  }

  get startJoints(): Joint[] {
    const t = this.jointTables;
    return jointList(t.joints, t.startStart, t.startIndex, this.index);
  }

  get endJoints(): Joint[] {
    const t = this.jointTables;
    return jointList(t.joints, t.endStart, t.endIndex, this.index);
  }

  get startJointCount(): number {
    return this.jointTables.startStart[this.index + 1] - this.jointTables.startStart[this.index];
  }

  get endJointCount(): number {
    return this.jointTables.endStart[this.index + 1] - this.jointTables.endStart[this.index];
  }
}

export function jointsAt(info: ProfileInfo, end: ProfileEnd): Joint[] {
  return end === 'start' ? info.startJoints : info.endJoints;
}

/** How many joints have a member at this end (`jointsAt(info, end).length` without the list). */
export function jointCountAt(info: ProfileInfo, end: ProfileEnd): number {
  return end === 'start' ? info.startJointCount : info.endJointCount;
}

export function accessoriesAt(info: ProfileInfo, end: ProfileEnd): Accessory[] {
  return end === 'start' ? info.startAccessories : info.endAccessories;
}

/** True when some joint holds both profiles. */
export function areJoined(ctx: AnalysisContext, a: string, b: string): boolean {
  const info = ctx.profileById.get(a);
  if (!info) return false;
  const joints = ctx.design.joints;
  for (let k = ctx.profileJointStart[info.index]; k < ctx.profileJointStart[info.index + 1]; k++) {
    for (const m of joints[ctx.profileJointIndex[k]].members) if (m.profileId === b) return true;
  }
  return false;
}

/** Joints by id, built on first use (few analyses need it). */
export function jointByIdOf(ctx: AnalysisContext): Map<string, Joint> {
  let byId = ctx.memo.get('jointById') as Map<string, Joint> | undefined;
  if (!byId) {
    byId = new Map();
    for (const joint of ctx.design.joints) byId.set(joint.id, joint);
    ctx.memo.set('jointById', byId);
  }
  return byId;
}

/** Every id in the document (profiles, joints, panels, accessories, sub-assemblies), built on first use. */
export function allDesignIds(ctx: AnalysisContext): Set<string> {
  let ids = ctx.memo.get('allIds') as Set<string> | undefined;
  if (!ids) {
    const d = ctx.design;
    ids = new Set<string>();
    for (const list of [d.profiles, d.joints, d.panels, d.accessories, d.subAssemblies] as { id: string }[][]) for (const x of list) ids.add(x.id);
    ctx.memo.set('allIds', ids);
  }
  return ids;
}

export interface PanelInfo {
  index: number;
  panel: Panel;
  material: PanelMaterial | undefined;
  /** Bounding profiles found in the design (captured panels). */
  bounding: ProfileInfo[];
  /** Slot opening and engagement of the bounding profiles (smallest), mm; null when not captured. */
  slotOpening: number | null;
  engagement: number;
  /** Sheet to cut, mm: captured = opening + 2 × engagement − clearance. */
  sheetWidth: number;
  sheetHeight: number;
  /** The solid for interference: the visible part of the sheet. */
  box: Box;
}

export interface AnalysisContext {
  design: DesignDocument;
  catalogue: CatalogueIndex;
  alloy: Alloy | undefined;
  profiles: ProfileInfo[];
  profileById: Map<string, ProfileInfo>;
  panels: PanelInfo[];
  panelById: Map<string, PanelInfo>;
  /**
   * Joint members resolved to profile indices once, in document order: the members of joint j
   * (`design.joints[j]`) are `jointMemberProfile[jointMemberStart[j] + k]`, −1 for a profile not in
   * the design. Checks read these instead of looking ids up in `profileById` per joint.
   */
  jointMemberStart: Int32Array;
  jointMemberProfile: Int32Array;
  /**
   * `profiles[i].joints` as joint indices (into `design.joints`), in the same order: entries
   * `profileJointStart[i]` up to `profileJointStart[i + 1]` of `profileJointIndex`.
   */
  profileJointStart: Int32Array;
  profileJointIndex: Int32Array;
  /** Per accessory (`design.accessories[a]`): the index of its profile, or −1 (none, or not in the design). */
  accessoryProfile: Int32Array;
  /** Spatial index over `profiles[i].box`. */
  profileGrid: UniformGrid;
  /** Memo for results several checks and outputs share, keyed by name and part id. */
  memo: Map<string, unknown>;
}

/**
 * Builds the context. It is one object literal of plain data fields: an accessor in the literal
 * makes the engine keep the object's properties in a hash table, so every `ctx.x` read in every
 * check would be a look-up (memoised extras such as `jointByIdOf` go through `memo`).
 */
export function buildAnalysisContext(design: DesignDocument, catalogue: CatalogueIndex): AnalysisContext {
  // Made at its final length (a list grown by push is copied each time it fills).
  const profiles = new Array<ProfileInfo>(design.profiles.length);
  const profileById = new Map<string, ProfileInfo>();
  // Frames repeat a few directions and rolls, so profiles share one (read-only) SectionAxes per pair.
  const orientations = new OrientationCache();
  // The profile boxes, six numbers each, written straight into the table the grid indexes.
  const corners = new Float64Array(design.profiles.length * 6);
  // Filled in by `attachJoints` once every profile has its record.
  const none = new Int32Array(0);
  const jointTables: ProfileJointTables = { joints: design.joints, anyStart: none, anyIndex: none, startStart: none, startIndex: none, endStart: none, endIndex: none };
  for (let i = 0; i < design.profiles.length; i++) {
    const profile = design.profiles[i];
    const variant = catalogue.variants.get(profile.variantId);
    const system = variant ? catalogue.systems.get(variant.systemId) : undefined;
    const width = variant?.width ?? UNKNOWN_SECTION_MM;
    const height = variant?.height ?? UNKNOWN_SECTION_MM;
    const axes = orientations.axes(profile.direction, profile.rollDeg);
    const endPoint = pointAlongProfile(profile, profile.length);
    profileBoundsInto(profile.start, endPoint, width, height, axes, corners, i * 6);
    const info = new ProfileRecord(i, profile, variant, system, width, height, axes, endPoint, corners, jointTables);
    profiles[i] = info;
    profileById.set(profile.id, info);
  }

  const jointMembers = attachJoints(design.joints, profiles.length, profileById, jointTables);
  const accessoryProfile = attachAccessories(design.accessories, profiles, profileById);

  const panels: PanelInfo[] = [];
  const panelById = new Map<string, PanelInfo>();
  for (let i = 0; i < design.panels.length; i++) {
    const info = panelInfo(i, design, catalogue, profileById);
    panels.push(info);
    panelById.set(info.panel.id, info);
  }

  return {
    design,
    catalogue,
    alloy: catalogue.alloys.get(design.settings.alloyId),
    profiles,
    profileById,
    panels,
    panelById,
    jointMemberStart: jointMembers.start,
    jointMemberProfile: jointMembers.profile,
    profileJointStart: jointMembers.profileJointStart,
    profileJointIndex: jointMembers.profileJointIndex,
    accessoryProfile,
    profileGrid: new UniformGrid(corners, { margin: CONTACT_TOLERANCE_MM }),
    memo: new Map(),
  };
}

/** Distinct orientations kept in a short list (compared by number) before falling back to a keyed map. */
const ORIENTATION_LIST_MAX = 16;

/**
 * SectionAxes per (direction, roll), shared by every profile with exactly that orientation (−0 and
 * 0 count as different, as a text key would). Frames have a handful of orientations, so a short
 * list compared by number avoids building a key string per profile.
 */
class OrientationCache {
  private readonly list: { d0: number; d1: number; d2: number; roll: number; axes: SectionAxes }[] = [];
  private readonly byKey = new Map<string, SectionAxes>();

  axes(direction: Profile['direction'], rollDeg: number): SectionAxes {
    const d0 = direction[0];
    const d1 = direction[1];
    const d2 = direction[2];
    for (const o of this.list) {
      if (Object.is(o.d0, d0) && Object.is(o.d1, d1) && Object.is(o.d2, d2) && Object.is(o.roll, rollDeg)) return o.axes;
    }
    if (this.list.length < ORIENTATION_LIST_MAX) {
      const axes = sectionAxes(direction, rollDeg);
      this.list.push({ d0, d1, d2, roll: rollDeg, axes });
      return axes;
    }
    const key = `${exactText(d0)},${exactText(d1)},${exactText(d2)},${exactText(rollDeg)}`;
    let axes = this.byKey.get(key);
    if (!axes) this.byKey.set(key, (axes = sectionAxes(direction, rollDeg)));
    return axes;
  }
}

/** A number as text that tells −0 from 0 (String(-0) is "0"), so cache keys stay exact. */
function exactText(x: number): string {
  return Object.is(x, -0) ? '-0' : String(x);
}

/** The profile of member `k` of joint `jointIndex` (`design.joints[jointIndex]`), or undefined when it is not in the design. */
export function memberInfo(ctx: AnalysisContext, jointIndex: number, k: number): ProfileInfo | undefined {
  const at = ctx.jointMemberStart[jointIndex] + k;
  if (k < 0 || at >= ctx.jointMemberStart[jointIndex + 1]) return undefined;
  const i = ctx.jointMemberProfile[at];
  return i < 0 ? undefined : ctx.profiles[i];
}

/** The profile accessory `accessoryIndex` (`design.accessories[accessoryIndex]`) is fitted to, or undefined. */
export function accessoryInfo(ctx: AnalysisContext, accessoryIndex: number): ProfileInfo | undefined {
  const i = ctx.accessoryProfile[accessoryIndex];
  return i < 0 ? undefined : ctx.profiles[i];
}

function panelInfo(index: number, design: DesignDocument, catalogue: CatalogueIndex, profileById: Map<string, ProfileInfo>): PanelInfo {
  const panel = design.panels[index];
  const material = catalogue.panelMaterials.get(panel.materialId);
  // At its final length when every id resolves (as they do in a valid design).
  const ids = panel.boundedBy ?? NONE;
  let bounding = new Array<ProfileInfo>(ids.length);
  let resolved = 0;
  for (let k = 0; k < ids.length; k++) {
    const p = profileById.get(ids[k]);
    if (p) bounding[resolved++] = p;
  }
  if (resolved < ids.length) bounding = bounding.slice(0, resolved);
  let slotOpening: number | null = null;
  let engagement = 0;
  if (panel.mounting === 'captured') {
    // `slotLimitsOf` over the bounding profiles' systems (the design's system when none has one),
    // worked out in place: no list of systems per panel.
    let opening = Infinity;
    let depth = Infinity;
    let found = false;
    for (let k = 0; k < bounding.length; k++) {
      const system = bounding[k].system;
      if (!system) continue;
      found = true;
      if (system.slotOpening < opening) opening = system.slotOpening;
      if (system.slotEngagement < depth) depth = system.slotEngagement;
    }
    if (!found) {
      const fallback = catalogue.systems.get(design.systemId);
      if (fallback) {
        found = true;
        opening = fallback.slotOpening;
        depth = fallback.slotEngagement;
      }
    }
    if (found) {
      slotOpening = opening;
      engagement = depth;
    }
  }
  const clearance = panel.mounting === 'captured' ? design.settings.panelClearance : 0;
  const sheetWidth = panel.rect.width + 2 * engagement - clearance;
  const sheetHeight = panel.rect.height + 2 * engagement - clearance;
  return {
    index,
    panel,
    material,
    bounding,
    slotOpening,
    engagement,
    sheetWidth,
    sheetHeight,
    box: panelBox(panel.rect.center, panel.rect.normal, panel.rect.width, panel.rect.height, panel.thickness),
  };
}

export { memberAlong, memberEnd, memberPoint } from './profileLinks';
export { panelAxes };
export type { Connector };
