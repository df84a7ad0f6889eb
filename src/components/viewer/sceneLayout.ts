/**
 * Turns a design into instance batches: profiles by variant, hardware by shape, machining discs,
 * sheets by material. Rendering follows the data: nothing here keeps state between designs.
 */
import * as THREE from 'three';
import type { Catalogue, ProfileVariant } from '@/domain/catalogue';
import type { DesignDocument, Panel, Profile } from '@/domain/design/schema';
import {
  addScaled,
  cross,
  dot,
  faceNormal,
  panelAxes,
  panelBox,
  pointAlongProfile,
  profileBoundingBox,
  profileEndPoint,
  scale,
  sectionAxes,
  sectionHalfExtentAlong,
  sub,
  type ReadonlyVec3,
  type Vec3,
} from '@/domain/geometry';
import { BatchCollector, basisMatrix, type PartBatchData } from './batchCollector';
import { layoutAccessories, layoutJoints } from './hardwareLayout';

/** Where a part is, roughly: a centre and a radius, for badges and camera framing (mm). */
export interface PartAnchor {
  center: Vec3;
  radius: number;
  /** Tight world box when known (profiles), mm; otherwise the sphere's box is used. */
  box?: { min: Vec3; max: Vec3 };
}

export interface SceneLayout {
  batches: PartBatchData[];
  /** Panels with round cut-outs: drawn one mesh each (few), sharing the material of their sheet. */
  cutoutPanels: Panel[];
  anchors: Map<string, PartAnchor>;
}

/** Lift of machining discs off the face, mm, so they never fight the face for depth. */
const MACHINING_LIFT = 0.25;

export function buildSceneLayout(design: DesignDocument, catalogue: Catalogue): SceneLayout {
  const collector = new BatchCollector();
  const anchors = new Map<string, PartAnchor>();
  const variants = new Map(catalogue.variants.map((v) => [v.id, v]));
  const m = new THREE.Matrix4();

  for (const profile of design.profiles) {
    const variant = variants.get(profile.variantId);
    const b = profileBoundingBox(profile, variant?.width ?? 40, variant?.height ?? 40);
    anchors.set(profile.id, {
      center: pointAlongProfile(profile, profile.length / 2),
      radius: profile.length / 2 + (variant?.height ?? 40) / 2,
      box: { min: [b.minX, b.minY, b.minZ], max: [b.maxX, b.maxY, b.maxZ] },
    });
    if (!variant) continue;
    collector.add('profile', { kind: 'profile', variantId: variant.id }, { kind: 'surface', key: 'aluminium' }, profile.id, profileMatrix(profile, m));
    layoutMachining(collector, profile, variant, m);
  }

  const profilesById = new Map(design.profiles.map((p) => [p.id, p]));
  layoutJoints(collector, anchors, design, profilesById, variants, catalogue);
  layoutAccessories(collector, anchors, design, profilesById, variants);

  const cutoutPanels: Panel[] = [];
  for (const panel of design.panels) {
    const pb = panelBox(panel.rect.center, panel.rect.normal, panel.rect.width, panel.rect.height, panel.thickness);
    anchors.set(panel.id, {
      center: [...panel.rect.center] as Vec3,
      radius: Math.hypot(panel.rect.width, panel.rect.height) / 2,
      box: { min: [pb.minX, pb.minY, pb.minZ], max: [pb.maxX, pb.maxY, pb.maxZ] },
    });
    if (panel.cutouts.length > 0) {
      cutoutPanels.push(panel);
      continue;
    }
    collector.add('panel', { kind: 'hardware', shape: 'sheet' }, { kind: 'panel', materialId: panel.materialId }, panel.id, panelMatrix(panel, m));
  }

  return { batches: collector.result(), cutoutPanels, anchors };
}

/**
 * The instance matrix of a profile: the unit extrusion's x/y become the section axes (roll
 * included), its z the profile axis stretched to the length, its origin the profile start.
 */
export function profileMatrix(profile: Pick<Profile, 'start' | 'direction' | 'length' | 'rollDeg'>, out = new THREE.Matrix4()): THREE.Matrix4 {
  const { u, v, axis } = sectionAxes(profile.direction, profile.rollDeg ?? 0);
  return basisMatrix(out, u, v, scale(axis, profile.length), profile.start);
}

/** A sheet's matrix for a unit box: width and height along the panel's axes, thickness along its normal. */
export function panelMatrix(panel: Panel, out = new THREE.Matrix4()): THREE.Matrix4 {
  const { w, h } = panelAxes(panel.rect.normal);
  const ew = unitAxis(w);
  const eh = unitAxis(h);
  // Keep the basis right-handed so faces keep their winding.
  return basisMatrix(out, scale(ew, panel.rect.width), scale(eh, panel.rect.height), scale(cross(ew, eh), panel.thickness), panel.rect.center);
}

/** Rotation part of a sheet's frame (width, height, normal axes), for cut-out meshes. */
export function panelBasis(panel: Panel, out = new THREE.Matrix4()): THREE.Matrix4 {
  const { w, h } = panelAxes(panel.rect.normal);
  const ew = unitAxis(w);
  const eh = unitAxis(h);
  return basisMatrix(out, ew, eh, cross(ew, eh), panel.rect.center);
}

function layoutMachining(collector: BatchCollector, profile: Profile, variant: ProfileVariant, m: THREE.Matrix4): void {
  if (profile.machining.length === 0) return;
  const axes = sectionAxes(profile.direction, profile.rollDeg ?? 0);
  const cell = Math.min(variant.width, variant.height);
  for (const hole of profile.machining) {
    const diameter = hole.diameter ?? cell * 0.22;
    const along = hole.fromEnd === 'start' ? hole.offset : profile.length - hole.offset;
    if (hole.kind === 'end-tap') {
      // A dark ring on the end face, centred on the bore.
      const outward = hole.fromEnd === 'start' ? scale(axes.axis, -1) : axes.axis;
      const center = addScaled(profileEndPoint(profile, hole.fromEnd), outward, MACHINING_LIFT);
      const x = hole.fromEnd === 'start' ? axes.v : axes.u;
      const y = hole.fromEnd === 'start' ? axes.u : axes.v;
      collector.add('machining', { kind: 'hardware', shape: 'disc' }, { kind: 'surface', key: 'machining' }, profile.id, basisMatrix(m, scale(x, diameter), scale(y, diameter), outward, center));
      continue;
    }
    const normal = faceNormal(axes, hole.face);
    const depth = sectionHalfExtentAlong(axes, variant.width, variant.height, normal);
    const center = addScaled(pointAlongProfile(profile, along), normal, depth + MACHINING_LIFT);
    const y = cross(normal, axes.axis);
    collector.add('machining', { kind: 'hardware', shape: 'disc' }, { kind: 'surface', key: 'machining' }, profile.id, basisMatrix(m, scale(axes.axis, diameter), scale(y, diameter), normal, center));
  }
}

export function unitAxis(i: 0 | 1 | 2): Vec3 {
  return i === 0 ? [1, 0, 0] : i === 1 ? [0, 1, 0] : [0, 0, 1];
}

/** Any unit vector perpendicular to `a`. */
export function perpendicular(a: ReadonlyVec3): Vec3 {
  const helper: Vec3 = Math.abs(a[1]) < 0.9 ? [0, 1, 0] : [1, 0, 0];
  const p = sub(helper, scale(a, dot(helper, a)));
  const l = Math.hypot(p[0], p[1], p[2]);
  return [p[0] / l, p[1] / l, p[2] / l];
}
