/**
 * Where connectors, their screws and accessories sit. The drawings are simplified: a bracket in
 * the inside corner of a joint, a gusset on the shared face, a cube at a three-way corner, a
 * screw head over an end screw's access hole; feet, casters and caps on profile ends.
 */
import * as THREE from 'three';
import type { Catalogue, ProfileVariant } from '@/domain/catalogue';
import type { Accessory, DesignDocument, Joint, Panel, Profile } from '@/domain/design/schema';
import {
  addScaled,
  cross,
  dot,
  faceNormal,
  normalize,
  pointAlongProfile,
  profileEndPoint,
  scale,
  sectionAxes,
  sectionHalfExtentAlong,
  sub,
  type ReadonlyVec3,
  type Vec3,
} from '@/domain/geometry';
import { BatchCollector, basisMatrix, type BatchRole } from './batchCollector';
import { BRACKET_LEG_SHARE, type HardwareShape } from './hardwareGeometry';
import type { SurfaceKey } from './sceneResources';
import { perpendicular, type PartAnchor } from './sceneLayout';

type Variants = Map<string, ProfileVariant>;
type Profiles = Map<string, Profile>;

const m = new THREE.Matrix4();

export function layoutJoints(
  collector: BatchCollector,
  anchors: Map<string, PartAnchor>,
  design: DesignDocument,
  profiles: Profiles,
  variants: Variants,
  catalogue: Catalogue,
): void {
  const connectors = new Map(catalogue.connectors.map((c) => [c.id, c]));
  for (const joint of design.joints) {
    const frame = jointFrame(joint, profiles, variants);
    if (!frame) continue;
    const { base, a, cell } = frame;
    anchors.set(joint.id, { center: base, radius: cell });
    const add = (role: BatchRole, shape: HardwareShape, surface: SurfaceKey, matrix: THREE.Matrix4) =>
      collector.add(role, { kind: 'hardware', shape }, { kind: 'surface', key: surface }, joint.id, matrix);
    const screw = (at: ReadonlyVec3, axis: ReadonlyVec3) => add('fastener', 'screw-head', 'steel', axisMatrix(at, axis, cell * 0.3, cell * 0.12));
    const sides = frame.sides.slice(0, Math.max(1, joint.quantity));

    switch (joint.kind) {
      case 'corner-bracket':
      case 'hinge': {
        const leg = cell * 0.9;
        for (const n of sides) {
          const corner = addScaled(base, n, frame.halfAcross(n));
          const z = cross(n, a);
          if (joint.kind === 'hinge') {
            add('connector', 'block', 'cast', basisMatrix(m, scale(n, cell * 0.3), scale(a, leg), scale(z, cell * 0.45), addScaled(addScaled(corner, n, cell * 0.15), a, leg / 2)));
            continue;
          }
          add('connector', 'bracket', 'cast', basisMatrix(m, scale(n, leg), scale(a, leg), scale(z, cell * 0.45), corner));
          const t = BRACKET_LEG_SHARE * leg;
          screw(addScaled(addScaled(corner, a, leg * 0.62), n, t), n);
          screw(addScaled(addScaled(corner, n, leg * 0.62), a, t), a);
        }
        break;
      }
      case 'gusset-plate': {
        const n = sides[0];
        const normal = normalize(cross(n, a));
        const plate = connectors.get(joint.connectorId)?.plate;
        const thickness = plate?.thickness ?? Math.max(3, cell * 0.1);
        for (const side of joint.quantity > 1 ? [1, -1] : [1]) {
          const out = scale(normal, side);
          const origin = addScaled(base, out, frame.halfAcross(out) + thickness / 2);
          // The plate is centred on its thickness, so one right-handed basis serves both faces.
          add('connector', 'gusset', 'cast', basisMatrix(m, scale(n, cell), scale(a, cell), scale(normal, thickness), origin));
          for (const [sx, sy] of [
            [0, 0.5],
            [0, 1.1],
            [0.9, -0.5],
            [1.6, -0.5],
          ]) {
            screw(addScaled(addScaled(addScaled(origin, n, sx * cell), a, sy * cell), out, thickness / 2), out);
          }
        }
        break;
      }
      case 'corner-cube': {
        const center = addScaled(frame.end, a, -cell / 2);
        const x = perpendicular(a);
        add('connector', 'cube', 'cast', basisMatrix(m, scale(x, cell), scale(a, cell), scale(cross(x, a), cell), center));
        break;
      }
      case 'end-screw': {
        // The head sits in the access hole on the met profile's far face.
        const far = addScaled(base, a, -2 * frame.metHalfDepth);
        screw(addScaled(far, a, cell * 0.05), scale(a, -1));
        break;
      }
      case 'concealed-connector':
        // Hidden inside the profile end; its access counterbore shows as machining.
        break;
    }
  }
}

interface JointFrame {
  /** The joined profile's end point on its axis. */
  end: Vec3;
  /** Where that end meets the met profile's face, on the joined profile's axis. */
  base: Vec3;
  /** Unit vector from the joint into the joined profile. */
  a: Vec3;
  /** Directions across the joined profile where brackets go, most likely first. */
  sides: Vec3[];
  cell: number;
  /** Half the met profile's depth along `a`, mm. */
  metHalfDepth: number;
  /** How far the joined profile's section reaches along a direction, mm. */
  halfAcross(direction: ReadonlyVec3): number;
}

function jointFrame(joint: Joint, profiles: Profiles, variants: Variants): JointFrame | null {
  const [first, second] = joint.members;
  const p0 = profiles.get(first.profileId);
  const p1 = second ? profiles.get(second.profileId) : undefined;
  const v0 = p0 && variants.get(p0.variantId);
  if (!p0 || !v0) return null;
  const end = first.at === 'span' ? pointAlongProfile(p0, first.along ?? 0) : profileEndPoint(p0, first.at);
  const a = first.at === 'end' ? scale(p0.direction, -1) : [...p0.direction] as Vec3;
  const axes0 = sectionAxes(p0.direction, p0.rollDeg ?? 0);
  const halfAcross = (d: ReadonlyVec3) => sectionHalfExtentAlong(axes0, v0.width, v0.height, d);
  const cell = Math.min(v0.width, v0.height);
  const v1 = p1 && variants.get(p1.variantId);
  if (!p1 || !v1 || Math.abs(dot(p1.direction, a)) > 0.99) {
    return { end, base: end, a, sides: [axes0.u, axes0.v, scale(axes0.u, -1), scale(axes0.v, -1)], cell, metHalfDepth: 0, halfAcross };
  }
  const axes1 = sectionAxes(p1.direction, p1.rollDeg ?? 0);
  const metHalfDepth = sectionHalfExtentAlong(axes1, v1.width, v1.height, a);
  const along1 = Math.min(p1.length, Math.max(0, dot(sub(end, p1.start), p1.direction)));
  const onAxis1 = pointAlongProfile(p1, along1);
  // Faces-touching and centre-line conventions both land the base on the met profile's face.
  const gap = dot(sub(end, onAxis1), a);
  const base = addScaled(end, a, Math.max(0, metHalfDepth - gap));
  const b1: Vec3 = [...p1.direction] as Vec3;
  const minus: Vec3 = scale(b1, -1);
  const across = cross(a, b1);
  const nearStart = along1 < cell;
  const nearEnd = along1 > p1.length - cell;
  const sides = nearStart ? [b1, across, scale(across, -1)] : nearEnd ? [minus, across, scale(across, -1)] : [b1, minus, across, scale(across, -1)];
  return { end, base, a, sides, cell, metHalfDepth, halfAcross };
}

export function layoutAccessories(collector: BatchCollector, anchors: Map<string, PartAnchor>, design: DesignDocument, profiles: Profiles, variants: Variants): void {
  const panels = new Map(design.panels.map((p) => [p.id, p]));
  for (const accessory of design.accessories) {
    const profile = accessory.profileId ? profiles.get(accessory.profileId) : undefined;
    const variant = profile && variants.get(profile.variantId);
    const add = (shape: HardwareShape, surface: SurfaceKey, matrix: THREE.Matrix4) =>
      collector.add('accessory', { kind: 'hardware', shape }, { kind: 'surface', key: surface }, accessory.id, matrix);
    if (!profile || !variant) {
      const panel = accessory.panelId ? panels.get(accessory.panelId) : undefined;
      if (!panel) continue;
      // A handle or latch on a door: a small bar standing off the sheet's centre.
      const n: Vec3 = panel.rect.normal === 'x' ? [1, 0, 0] : panel.rect.normal === 'y' ? [0, 1, 0] : [0, 0, 1];
      const center = addScaled(panel.rect.center, n, panel.thickness / 2 + 8);
      const x = perpendicular(n);
      add('block', 'steel', basisMatrix(m, scale(x, 16), scale(cross(n, x), accessory.kind === 'handle' ? 120 : 30), scale(n, 16), center));
      anchors.set(accessory.id, { center, radius: 60 });
      continue;
    }
    const axes = sectionAxes(profile.direction, profile.rollDeg ?? 0);
    const cell = Math.min(variant.width, variant.height);
    const endName = accessory.end ?? 'start';
    const outward = endName === 'start' ? scale(axes.axis, -1) : axes.axis;
    const endPoint = profileEndPoint(profile, endName);
    switch (accessory.kind) {
      case 'leveling-foot':
      case 'caster': {
        const x = perpendicular(outward);
        const matrix = basisMatrix(m, scale(x, cell), scale(outward, cell), scale(cross(x, outward), cell), endPoint);
        add(accessory.kind === 'caster' ? 'caster' : 'foot', accessory.kind === 'caster' ? 'rubber' : 'steel', matrix);
        anchors.set(accessory.id, { center: addScaled(endPoint, outward, cell / 2), radius: cell });
        break;
      }
      case 'end-cap': {
        const [x, y, w, h] = endName === 'start' ? [axes.v, axes.u, variant.height, variant.width] : [axes.u, axes.v, variant.width, variant.height];
        add('end-cap', 'plastic', basisMatrix(m, scale(x, w + 0.6), scale(y, h + 0.6), scale(outward, Math.max(2, cell * 0.07)), endPoint));
        anchors.set(accessory.id, { center: endPoint, radius: cell });
        break;
      }
      default: {
        const along = accessory.along ?? 0;
        const length = accessory.length ?? (accessory.kind === 'gasket' || accessory.kind === 'slot-cover' || accessory.kind === 'door-track' ? profile.length - along : cell * 2);
        const normal = accessory.kind === 'door-track' ? trackFaceNormal(profile, axes, design.panels) : faceNormal(axes, 0);
        const depth = sectionHalfExtentAlong(axes, variant.width, variant.height, normal);
        const strip = stripSize(accessory, cell);
        const center = addScaled(pointAlongProfile(profile, Math.min(profile.length, along + length / 2)), normal, depth + strip.stand / 2);
        const y = cross(normal, axes.axis);
        add(strip.shape, strip.surface, basisMatrix(m, scale(axes.axis, length), scale(y, strip.width), scale(normal, strip.stand), center));
        anchors.set(accessory.id, { center, radius: length / 2 });
      }
    }
  }
}

/** A door track sits on the rail face towards the door leaves the rail bounds; without leaves, on face 1. */
function trackFaceNormal(profile: Profile, axes: ReturnType<typeof sectionAxes>, panels: Panel[]): Vec3 {
  const leaf = panels.find((panel) => panel.role === 'door' && panel.boundedBy?.includes(profile.id));
  if (!leaf) return faceNormal(axes, 1);
  const n = AXIS_INDEX[leaf.rect.normal];
  const offset = leaf.rect.center[n] - pointAlongProfile(profile, profile.length / 2)[n];
  const toward: Vec3 = [0, 0, 0];
  toward[n] = offset < 0 ? -1 : 1;
  // The section face whose normal points most nearly towards the leaves.
  return [0, 1, 2, 3].map((face) => faceNormal(axes, face)).reduce((best, normal) => (dot(normal, toward) > dot(best, toward) ? normal : best));
}

const AXIS_INDEX = { x: 0, y: 1, z: 2 } as const;

function stripSize(accessory: Accessory, cell: number): { shape: HardwareShape; surface: SurfaceKey; width: number; stand: number } {
  switch (accessory.kind) {
    case 'slot-cover':
      return { shape: 'block', surface: 'plastic', width: cell * 0.22, stand: 0.8 };
    case 'gasket':
      return { shape: 'block', surface: 'rubber', width: cell * 0.2, stand: 1.5 };
    case 'door-track':
      return { shape: 'block', surface: 'cast', width: cell * 0.6, stand: cell * 0.25 };
    case 'handle':
      return { shape: 'block', surface: 'steel', width: cell * 0.25, stand: cell * 0.8 };
    default:
      return { shape: 'block', surface: 'steel', width: cell * 0.5, stand: cell * 0.3 };
  }
}

/** A shape whose local +y is `axis`, `diameter` across and `height` tall, based at `at`. */
function axisMatrix(at: ReadonlyVec3, axis: ReadonlyVec3, diameter: number, height: number): THREE.Matrix4 {
  const x = perpendicular(axis);
  return basisMatrix(m, scale(x, diameter), scale(axis, height), scale(cross(x, axis), diameter), at);
}
