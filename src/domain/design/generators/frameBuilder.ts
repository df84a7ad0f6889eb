/**
 * Builds rectangular frames the way a shop does: four uprights at the corners running the full
 * height, horizontal rails at each level running between the uprights (their ends butt against
 * the uprights' faces, so nothing overlaps), captured panels in the openings, face-mounted tops
 * and doors, feet and end caps. Space: X width, Y up, Z depth, centred on X and Z, floor at Y 0.
 */
import { connectorFor, getSystem, getVariant } from '../../catalogue';
import type { Catalogue, ProfileSystem, ProfileVariant } from '../../catalogue/types';
import { createEmptyDesign } from '../create';
import { addFeetToFreeBottomEnds, autoEndCaps } from '../endTreatments';
import { createIdAllocator, type IdAllocator } from '../ids';
import { addJoints, type JointInput } from '../operations';
import { thickestFittingThickness } from '../slotLimits';
import type { Accessory, AssemblyStep, DesignDocument, LoadCase, Panel, Profile, SubAssembly, Vec3 } from '../schema';
import { generateSteps } from '../../assembly/generateSteps';

export type FrameFace = 'back' | 'left' | 'right' | 'front';
export type RailSide = 'back' | 'left' | 'right' | 'front';

export interface FrameLevel {
  /** Height of the rails' axis, mm. */
  y: number;
  name: string;
  /** A captured shelf panel in this level's opening. */
  shelf?: { materialId: string; thickness: number; role?: Panel['role']; label?: string };
}

export interface PanelSpec {
  materialId: string;
  thickness: number;
}

export interface FramePlan {
  name: string;
  description?: string;
  systemId: string;
  /** Variant for the rails; uprights use the system's square variant. */
  railVariantId?: string;
  width: number;
  depth: number;
  /** Height of the uprights, mm. */
  postHeight: number;
  levels: FrameLevel[];
  /** Captured panels in the vertical openings between consecutive levels. */
  walls?: { faces: FrameFace[]; panel: PanelSpec };
  /** Face-mounted sheet on top of the uprights. */
  top?: PanelSpec & { overhang?: number; role?: Panel['role'] };
  /** Face-mounted doors on the front, one per band between levels. */
  doors?: PanelSpec;
  feet?: 'leveling-foot' | 'caster' | 'none';
  tags?: string[];
}

export interface BuiltFrame {
  design: DesignDocument;
  posts: Record<'backLeft' | 'backRight' | 'frontLeft' | 'frontRight', string>;
  /** Rail ids per level, by side. */
  rails: Record<RailSide, string>[];
  /** Joint ids per rail. */
  jointsOfRail: Map<string, string[]>;
  shelves: (string | undefined)[];
  /** Wall panels per band (band k lies between level k and k + 1), by face. */
  walls: Partial<Record<FrameFace, string>>[];
  doors: string[];
  top?: string;
  system: ProfileSystem;
  post: ProfileVariant;
  rail: ProfileVariant;
}

const round = (v: number) => Math.round(v * 1000) / 1000;

/** Largest listed thickness of a material that fits the system's slot (the one rule in design/slotLimits.ts), mm. */
export function fittingThickness(catalogue: Catalogue, system: ProfileSystem, materialId: string): number | undefined {
  const material = catalogue.panelMaterials.find((m) => m.id === materialId);
  return thickestFittingThickness(material?.thicknesses ?? [], system.slotOpening);
}

/**
 * A sheet for a captured panel: the requested material at its thickest fitting size, or else the
 * material of `preference` that comes thickest while still fitting (a snug sheet needs no gasket).
 */
export function capturedSheet(catalogue: Catalogue, system: ProfileSystem, requested: string | undefined, preference: string[]): PanelSpec {
  let best: PanelSpec | undefined;
  for (const id of requested !== undefined ? [requested] : [...preference, 'hdpe', 'acm']) {
    const thickness = fittingThickness(catalogue, system, id);
    if (thickness !== undefined && (!best || thickness > best.thickness)) best = { materialId: id, thickness };
  }
  if (!best) throw new Error(`No sheet of ${requested ?? preference.join(', ')} fits the ${system.name} slot`);
  return best;
}

export function buildFrame(plan: FramePlan, catalogue: Catalogue): BuiltFrame {
  const system = getSystem(catalogue, plan.systemId);
  if (!system) throw new Error(`Unknown profile system "${plan.systemId}"`);
  const post = getVariant(catalogue, system.defaultVariantId)!;
  const rail = getVariant(catalogue, plan.railVariantId ?? system.defaultVariantId) ?? post;
  const S = post.width;
  const railHalfY = rail.height / 2; // roll 0 keeps a tall rail's height vertical
  const railHalfAcross = rail.width / 2;
  const W = plan.width;
  const D = plan.depth;
  const base = createEmptyDesign({ name: plan.name, systemId: system.id }, catalogue);
  const ids: IdAllocator = createIdAllocator(base);
  const profiles: Profile[] = [];
  const joints: JointInput[] = [];
  const jointRails: string[] = [];

  const addProfile = (label: string, variant: ProfileVariant, start: Vec3, direction: Vec3, length: number): string => {
    const id = ids.next('p');
    profiles.push({ id, variantId: variant.id, length: round(length), start: start.map(round) as Vec3, direction, rollDeg: 0, label, machining: [] });
    return id;
  };

  const xPost = W / 2 - S / 2;
  const zPost = D / 2 - S / 2;
  const posts = {
    backLeft: addProfile('Upright, back left', post, [-xPost, 0, zPost], [0, 1, 0], plan.postHeight),
    backRight: addProfile('Upright, back right', post, [xPost, 0, zPost], [0, 1, 0], plan.postHeight),
    frontLeft: addProfile('Upright, front left', post, [-xPost, 0, -zPost], [0, 1, 0], plan.postHeight),
    frontRight: addProfile('Upright, front right', post, [xPost, 0, -zPost], [0, 1, 0], plan.postHeight),
  };
  const connectorKind = catalogue.connectors.find((c) => c.id === system.defaultConnectorId)?.kind ?? 'corner-bracket';
  const connectorId = connectorFor(catalogue, system.id, connectorKind)?.id;

  const joinBothEnds = (railId: string, startPost: string, endPost: string, y: number) => {
    joints.push(
      { kind: connectorKind, connectorId, members: [{ profileId: railId, at: 'start' }, { profileId: startPost, at: 'span', along: round(y) }] },
      { kind: connectorKind, connectorId, members: [{ profileId: railId, at: 'end' }, { profileId: endPost, at: 'span', along: round(y) }] },
    );
    jointRails.push(railId, railId);
  };

  const rails: Record<RailSide, string>[] = [];
  for (const level of plan.levels) {
    const y = level.y;
    const xLen = W - 2 * S;
    const zLen = D - 2 * S;
    // Rails along X at the front and back sit on the uprights' centre line; along Z at the sides.
    const back = addProfile(`${level.name} rail, back`, rail, [-W / 2 + S, y, zPost], [1, 0, 0], xLen);
    const front = addProfile(`${level.name} rail, front`, rail, [-W / 2 + S, y, -zPost], [1, 0, 0], xLen);
    const left = addProfile(`${level.name} rail, left`, rail, [-xPost, y, -D / 2 + S], [0, 0, 1], zLen);
    const right = addProfile(`${level.name} rail, right`, rail, [xPost, y, -D / 2 + S], [0, 0, 1], zLen);
    joinBothEnds(back, posts.backLeft, posts.backRight, y);
    joinBothEnds(front, posts.frontLeft, posts.frontRight, y);
    joinBothEnds(left, posts.frontLeft, posts.backLeft, y);
    joinBothEnds(right, posts.frontRight, posts.backRight, y);
    rails.push({ back, front, left, right });
  }

  let design = addJoints({ ...base, profiles }, joints, catalogue);
  const jointsOfRail = new Map<string, string[]>();
  design.joints.forEach((j, i) => {
    const railId = jointRails[i];
    jointsOfRail.set(railId, [...(jointsOfRail.get(railId) ?? []), j.id]);
  });

  const panels: Panel[] = [];
  const addPanel = (panel: Omit<Panel, 'id' | 'cutouts'>): string => {
    const id = ids.next('panel');
    panels.push({ ...panel, id, cutouts: [] });
    return id;
  };

  // Shelves: captured in the level's four rails; clear size between the rails' inner faces.
  const shelves = plan.levels.map((level, k) =>
    level.shelf
      ? addPanel({
          materialId: level.shelf.materialId,
          thickness: level.shelf.thickness,
          mounting: 'captured',
          role: level.shelf.role ?? 'shelf',
          boundedBy: [rails[k].front, rails[k].back, rails[k].left, rails[k].right],
          rect: { center: [0, round(level.y), 0], normal: 'y', width: round(W - 2 * S), height: round(D - 2 * (S / 2 + railHalfAcross)) },
          label: level.shelf.label ?? `${level.name} shelf`,
        })
      : undefined,
  );

  // Walls: captured between two uprights and the rails of two consecutive levels.
  const walls: Partial<Record<FrameFace, string>>[] = [];
  for (let k = 0; k + 1 < plan.levels.length; k++) {
    const lower = plan.levels[k].y + railHalfY;
    const upper = plan.levels[k + 1].y - railHalfY;
    const band: Partial<Record<FrameFace, string>> = {};
    for (const face of plan.walls?.faces ?? []) {
      const panel = plan.walls!.panel;
      const cy = round((lower + upper) / 2);
      const h = round(upper - lower);
      const common = { materialId: panel.materialId, thickness: panel.thickness, mounting: 'captured' as const, role: 'panel' as const };
      if (face === 'back' || face === 'front') {
        const z = face === 'back' ? zPost : -zPost;
        const [l, r] = face === 'back' ? [posts.backLeft, posts.backRight] : [posts.frontLeft, posts.frontRight];
        band[face] = addPanel({
          ...common,
          boundedBy: [rails[k][face], rails[k + 1][face], l, r],
          rect: { center: [0, cy, round(z)], normal: 'z', width: round(W - 2 * S), height: h },
          label: `${face === 'back' ? 'Back' : 'Front'} panel, ${plan.levels[k].name.toLowerCase()} to ${plan.levels[k + 1].name.toLowerCase()}`,
        });
      } else {
        const x = face === 'left' ? -xPost : xPost;
        const [f, b] = face === 'left' ? [posts.frontLeft, posts.backLeft] : [posts.frontRight, posts.backRight];
        band[face] = addPanel({
          ...common,
          boundedBy: [rails[k][face], rails[k + 1][face], f, b],
          rect: { center: [round(x), cy, 0], normal: 'x', width: h, height: round(D - 2 * S) },
          label: `${face === 'left' ? 'Left' : 'Right'} panel, ${plan.levels[k].name.toLowerCase()} to ${plan.levels[k + 1].name.toLowerCase()}`,
        });
      }
    }
    walls.push(band);
  }

  // Top: a sheet lying on the uprights and top rails.
  let top: string | undefined;
  if (plan.top) {
    const overhang = plan.top.overhang ?? 0;
    top = addPanel({
      materialId: plan.top.materialId,
      thickness: plan.top.thickness,
      mounting: 'face',
      role: plan.top.role ?? 'shelf',
      rect: { center: [0, round(plan.postHeight + plan.top.thickness / 2), 0], normal: 'y', width: round(W + 2 * overhang), height: round(D + 2 * overhang) },
      label: 'Top',
    });
  }

  // Doors: sheets on the front faces, hinged on the left upright, one per band, 2 mm apart.
  const doors: string[] = [];
  const accessories: Accessory[] = [];
  if (plan.doors) {
    const gap = 2;
    const hinge = catalogue.accessories.find((a) => a.kind === 'hinge' && a.systemIds.includes(system.id));
    const handle = catalogue.accessories.find((a) => a.kind === 'handle' && a.systemIds.includes(system.id));
    const latch = catalogue.accessories.find((a) => a.kind === 'latch' && a.systemIds.includes(system.id));
    for (let k = 0; k + 1 < plan.levels.length; k++) {
      const y0 = plan.levels[k].y + (k === 0 ? -railHalfY : gap / 2);
      const y1 = plan.levels[k + 1].y + (k + 2 === plan.levels.length ? railHalfY : -gap / 2);
      const door = addPanel({
        materialId: plan.doors.materialId,
        thickness: plan.doors.thickness,
        mounting: 'face',
        role: 'door',
        rect: { center: [0, round((y0 + y1) / 2), round(-D / 2 - plan.doors.thickness / 2)], normal: 'z', width: round(W - S), height: round(y1 - y0) },
        label: `Door, ${plan.levels[k].name.toLowerCase()} to ${plan.levels[k + 1].name.toLowerCase()}`,
      });
      doors.push(door);
      const h = y1 - y0;
      if (hinge) {
        for (const at of [y0 + h * 0.15, y1 - h * 0.15]) {
          accessories.push({ id: ids.next('acc'), kind: 'hinge', partId: hinge.id, profileId: posts.frontLeft, panelId: door, along: round(at), quantity: 1 });
        }
      }
      if (handle) accessories.push({ id: ids.next('acc'), kind: 'handle', partId: handle.id, panelId: door, quantity: 1 });
      if (latch) accessories.push({ id: ids.next('acc'), kind: 'latch', partId: latch.id, profileId: posts.frontRight, panelId: door, along: round((y0 + y1) / 2), quantity: 1 });
    }
  }

  design = {
    ...design,
    metadata: { description: plan.description, tags: plan.tags },
    panels,
    accessories: [...design.accessories, ...accessories],
  };
  if ((plan.feet ?? 'leveling-foot') !== 'none') design = addFeetToFreeBottomEnds(design, plan.feet === 'caster' ? 'caster' : 'leveling-foot', catalogue);
  design = autoEndCaps(design, catalogue);
  return { design, posts, rails, jointsOfRail, shelves, walls, doors, top, system, post, rail };
}

/** The built frame with its generated assembly steps (see `src/domain/assembly`). */
export function withGeneratedSteps(frame: BuiltFrame, catalogue: Catalogue): DesignDocument {
  return { ...frame.design, steps: generateSteps(frame.design, catalogue) };
}

export function withLoadCases(design: DesignDocument, loadCases: LoadCase[]): DesignDocument {
  return { ...design, loadCases };
}

export function withStepsAndSubAssemblies(design: DesignDocument, steps: AssemblyStep[], subAssemblies: SubAssembly[] = []): DesignDocument {
  return { ...design, steps, subAssemblies };
}
