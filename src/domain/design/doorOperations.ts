/**
 * Doors for a frame opening: a pair of sliding leaves on a door track along the two rails, or one
 * hinged leaf on an upright. Leaves are face-mounted sheets (role 'door') standing just outside the
 * opening and name the opening's four profiles, so removing a rail removes its doors and their
 * hardware. Lengths mm; pure, never changes its input.
 */
import { accessoryFor, defaultCatalogue, getVariant } from '../catalogue';
import type { Catalogue } from '../catalogue/types';
import { sectionAxes, sectionHalfExtentAlong } from '../geometry/profileGeometry';
import { createIdAllocator, type IdAllocator } from './ids';
import { OperationError, type DoorOpeningInput, type HingedDoorInput, type SlidingDoorsInput } from './operationTypes';
import type { Accessory, AccessoryKind, Axis, DesignDocument, Panel, Profile, Vec3 } from './schema';

/** Each sliding leaf reaches this far past the middle, so the two overlap by twice it (common practice, no source). */
export const SLIDING_LEAF_OVERLAP_MM = 15;
/** Gap between the rails' face and the rear leaf, and between the two leaves' lanes. */
export const DOOR_LANE_GAP_MM = 2;
/** Narrowest opening that takes two sliding leaves; our own limit so each leaf keeps room for a handle. */
export const MIN_SLIDING_OPENING_WIDTH_MM = 200;
/** Smallest opening side for any door (our own limit). */
export const MIN_DOOR_OPENING_MM = 100;
/** Thickest door sheet the door operations accept, mm. */
export const MAX_DOOR_THICKNESS_MM = 20;

const AXES: Axis[] = ['x', 'y', 'z'];
const unit = (i: number): Vec3 => [i === 0 ? 1 : 0, i === 1 ? 1 : 0, i === 2 ? 1 : 0];
const round = (v: number) => Math.round(v * 1000) / 1000;

interface OpeningFrame {
  normal: 0 | 1 | 2;
  w: 0 | 1 | 2;
  h: 0 | 1 | 2;
  /** The side the doors stand on along the normal: +1 or −1. */
  side: 1 | -1;
  bottom: Profile;
  top: Profile;
  left: Profile;
  right: Profile;
  /** Largest half-depth of the four profiles along the normal, mm. */
  halfDepth: number;
  /** Largest half-size of the rails across the opening's height, mm. */
  railHalf: number;
  systemId: string;
}

function findProfile(design: DesignDocument, id: string): Profile {
  const p = design.profiles.find((x) => x.id === id);
  if (!p) throw new OperationError(`There is no profile "${id}" in this design`);
  return p;
}

function halfAlong(profile: Profile, axis: number, catalogue: Catalogue): number {
  const v = getVariant(catalogue, profile.variantId);
  return sectionHalfExtentAlong(sectionAxes(profile.direction, profile.rollDeg), v?.width ?? 40, v?.height ?? 40, unit(axis));
}

/** Outside is away from the middle of all profiles along the normal; a flat frame opens to +normal. */
function outsideSide(design: DesignDocument, normal: number, plane: number): 1 | -1 {
  let min = Infinity;
  let max = -Infinity;
  for (const p of design.profiles) {
    const a = p.start[normal];
    const b = a + p.direction[normal] * p.length;
    min = Math.min(min, a, b);
    max = Math.max(max, a, b);
  }
  return plane < (min + max) / 2 - 0.5 ? -1 : 1;
}

function checkSheet(materialId: string, thickness: number, catalogue: Catalogue): void {
  if (!catalogue.panelMaterials.some((m) => m.id === materialId)) throw new OperationError(`Unknown panel material "${materialId}"`);
  if (!(thickness > 0) || thickness > MAX_DOOR_THICKNESS_MM) {
    throw new OperationError(`A door sheet must be more than 0 mm and at most ${MAX_DOOR_THICKNESS_MM} mm thick`);
  }
}

function openingFrame(design: DesignDocument, input: DoorOpeningInput, minWidth: number, what: string, catalogue: Catalogue): OpeningFrame {
  const { boundedBy, rect } = input.opening;
  if (boundedBy.length !== 4 || new Set(boundedBy).size !== 4) throw new OperationError('A door opening is bounded by four different profiles');
  const [bottom, top, left, right] = boundedBy.map((id) => findProfile(design, id));
  if (!(rect.width >= minWidth) || !(rect.height >= MIN_DOOR_OPENING_MM)) {
    throw new OperationError(
      `The opening is ${round(rect.width)} × ${round(rect.height)} mm; ${what} need at least ${minWidth} × ${MIN_DOOR_OPENING_MM} mm`,
    );
  }
  const normal = AXES.indexOf(rect.normal) as 0 | 1 | 2;
  const [w, h] = [0, 1, 2].filter((i) => i !== normal) as [0 | 1 | 2, 0 | 1 | 2];
  for (const rail of [bottom, top]) {
    if (Math.abs(Math.abs(rail.direction[w]) - 1) > 1e-6) throw new OperationError(`Profile ${rail.id} does not run across the opening's width`);
  }
  const halfDepth = Math.max(...[bottom, top, left, right].map((p) => halfAlong(p, normal, catalogue)));
  const railHalf = Math.max(halfAlong(bottom, h, catalogue), halfAlong(top, h, catalogue));
  const systemId = getVariant(catalogue, bottom.variantId)?.systemId ?? design.systemId;
  const side = input.side ?? outsideSide(design, normal, rect.center[normal]);
  return { normal, w, h, side, bottom, top, left, right, halfDepth, railHalf, systemId };
}

function requirePart(catalogue: Catalogue, systemId: string, kind: AccessoryKind, name: string) {
  const part = accessoryFor(catalogue, systemId, kind);
  if (!part) throw new OperationError(`The ${systemId} system has no ${name} in the catalogue`);
  return part;
}

/** Distance from a profile's start to the point where it reaches `coord` along `axis`, clamped to the profile. */
function alongAt(profile: Profile, axis: number, coord: number): number {
  const d = profile.direction[axis];
  return round(Math.min(profile.length, Math.max(0, (coord - profile.start[axis]) / d)));
}

function leaf(ids: IdAllocator, input: { materialId: string; thickness: number }, boundedBy: string[], rect: Panel['rect'], label: string): Panel {
  return {
    id: ids.next('panel'),
    materialId: input.materialId,
    thickness: input.thickness,
    mounting: 'face',
    role: 'door',
    boundedBy: [...boundedBy],
    rect,
    cutouts: [],
    label,
  };
}

/**
 * Two sliding leaves in an opening: a door track (sold by length, as long as the opening is wide)
 * on the bottom and top rails, the leaves in two lanes in front of the rails' face, each half the
 * width plus the overlap, and a handle on each leaf.
 */
export function addSlidingDoors(design: DesignDocument, input: SlidingDoorsInput, catalogue: Catalogue = defaultCatalogue): DesignDocument {
  checkSheet(input.materialId, input.thickness, catalogue);
  const f = openingFrame(design, input, MIN_SLIDING_OPENING_WIDTH_MM, 'two sliding doors', catalogue);
  const overlap = input.overlap ?? SLIDING_LEAF_OVERLAP_MM;
  if (!(overlap >= 0) || overlap > input.opening.rect.width / 4) {
    throw new OperationError(`The leaves' overlap must be between 0 and ${round(input.opening.rect.width / 4)} mm for this opening`);
  }
  const track = requirePart(catalogue, f.systemId, 'door-track', 'door track');
  const handle = requirePart(catalogue, f.systemId, 'handle', 'handle');
  const { rect, boundedBy } = input.opening;
  const ids = createIdAllocator(design);
  const x0 = rect.center[f.w] - rect.width / 2;
  const x1 = rect.center[f.w] + rect.width / 2;
  const leafWidth = round(rect.width / 2 + overlap);
  const leafHeight = round(rect.height + f.railHalf);
  const face = rect.center[f.normal] + f.side * f.halfDepth;
  const lanes = [face + f.side * (DOOR_LANE_GAP_MM + input.thickness / 2), face + f.side * (2 * DOOR_LANE_GAP_MM + (3 * input.thickness) / 2)];
  const leaves = [
    { at: x0 + leafWidth / 2, lane: lanes[0], label: 'Sliding door, left leaf' },
    { at: x1 - leafWidth / 2, lane: lanes[1], label: 'Sliding door, right leaf' },
  ].map(({ at, lane, label }) => {
    const center = [...rect.center] as Vec3;
    center[f.w] = round(at);
    center[f.normal] = round(lane);
    return leaf(ids, input, boundedBy, { center, normal: rect.normal, width: leafWidth, height: leafHeight }, label);
  });
  const accessories: Accessory[] = [
    ...[f.bottom, f.top].map(
      (rail): Accessory => ({
        id: ids.next('acc'),
        kind: 'door-track',
        partId: track.id,
        profileId: rail.id,
        along: Math.min(alongAt(rail, f.w, x0), alongAt(rail, f.w, x1)),
        length: round(rect.width),
        quantity: 1,
      }),
    ),
    ...leaves.map((p): Accessory => ({ id: ids.next('acc'), kind: 'handle', partId: handle.id, panelId: p.id, quantity: 1 })),
  ];
  return { ...design, panels: [...design.panels, ...leaves], accessories: [...design.accessories, ...accessories] };
}

/**
 * One hinged leaf over an opening, reaching to the profiles' centre lines, with two hinges on the
 * hinge-side upright (15 % and 85 % up), a handle, and a latch on the other upright.
 */
export function addHingedDoor(design: DesignDocument, input: HingedDoorInput, catalogue: Catalogue = defaultCatalogue): DesignDocument {
  checkSheet(input.materialId, input.thickness, catalogue);
  const f = openingFrame(design, input, MIN_DOOR_OPENING_MM, 'a hinged door', catalogue);
  const hinge = requirePart(catalogue, f.systemId, 'hinge', 'door hinge');
  const handle = requirePart(catalogue, f.systemId, 'handle', 'handle');
  const latch = accessoryFor(catalogue, f.systemId, 'latch');
  const { rect, boundedBy } = input.opening;
  const ids = createIdAllocator(design);
  const sideHalf = Math.max(halfAlong(f.left, f.w, catalogue), halfAlong(f.right, f.w, catalogue));
  const center = [...rect.center] as Vec3;
  center[f.normal] = round(rect.center[f.normal] + f.side * (f.halfDepth + input.thickness / 2));
  const door = leaf(ids, input, boundedBy, { center, normal: rect.normal, width: round(rect.width + 2 * sideHalf), height: round(rect.height + 2 * f.railHalf) }, 'Hinged door');
  const [hingeUpright, latchUpright] = (input.hingeSide ?? 'left') === 'left' ? [f.left, f.right] : [f.right, f.left];
  const y0 = rect.center[f.h] - rect.height / 2;
  const accessories: Accessory[] = [0.15, 0.85].map((share) => ({
    id: ids.next('acc'),
    kind: 'hinge',
    partId: hinge.id,
    profileId: hingeUpright.id,
    panelId: door.id,
    along: alongAt(hingeUpright, f.h, y0 + share * rect.height),
    quantity: 1,
  }));
  accessories.push({ id: ids.next('acc'), kind: 'handle', partId: handle.id, panelId: door.id, quantity: 1 });
  if (latch) {
    accessories.push({ id: ids.next('acc'), kind: 'latch', partId: latch.id, profileId: latchUpright.id, panelId: door.id, along: alongAt(latchUpright, f.h, rect.center[f.h]), quantity: 1 });
  }
  return { ...design, panels: [...design.panels, door], accessories: [...design.accessories, ...accessories] };
}
