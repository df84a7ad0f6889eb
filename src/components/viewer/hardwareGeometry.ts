/**
 * Simple shapes for hardware, drawn at unit size and placed by instance matrices: brackets,
 * gussets, cubes, screw heads, feet, casters, caps, machining discs, badges and sheets.
 * Our own simplified drawings: they show where parts are, not their exact form.
 */
import * as THREE from 'three';
import { mergeGeometries } from 'three/examples/jsm/utils/BufferGeometryUtils.js';

export type HardwareShape =
  | 'bracket'
  | 'gusset'
  | 'cube'
  | 'screw-head'
  | 'foot'
  | 'caster'
  | 'end-cap'
  | 'block'
  | 'disc'
  | 'badge'
  | 'sheet'
  | 'plane';

/** Leg thickness of the inside corner bracket, as a share of its leg length. */
const BRACKET_LEG = 0.24;

export function createHardwareGeometry(shape: HardwareShape): THREE.BufferGeometry {
  const geometry = build(shape);
  geometry.computeBoundingBox();
  geometry.computeBoundingSphere();
  return geometry;
}

function build(shape: HardwareShape): THREE.BufferGeometry {
  switch (shape) {
    case 'bracket': {
      // An L with a diagonal web: legs along +x and +y from the inside corner, 1 long, centred on z.
      const t = BRACKET_LEG;
      const outer = new THREE.Shape([v(0, 0), v(1, 0), v(1, t), v(t, 1), v(0, 1)]);
      outer.holes.push(new THREE.Path([v(t + 0.08, t + 0.08), v(t + 0.08, 0.62), v(0.62, t + 0.08)]));
      return centredExtrusion(outer);
    }
    case 'gusset': {
      // A flat L-shaped triangle plate, in units of the profile size; the joint's inside corner at the origin.
      const plate = new THREE.Shape([v(-0.5, -1), v(2, -1), v(2, -0.1), v(0.4, 1.5), v(-0.5, 1.5)]);
      return centredExtrusion(plate);
    }
    case 'cube':
    case 'block':
    case 'sheet':
      return new THREE.BoxGeometry(1, 1, 1);
    case 'end-cap':
      // From the profile end (z = 0) outwards.
      return new THREE.BoxGeometry(1, 1, 1).translate(0, 0, 0.5);
    case 'screw-head':
      // Base on the surface (y = 0), axis +y, slightly domed like a button head.
      return new THREE.CylinderGeometry(0.4, 0.5, 1, 8).translate(0, 0.5, 0);
    case 'foot':
      return mergeGeometries([
        new THREE.CylinderGeometry(0.12, 0.12, 0.55, 10).translate(0, 0.275, 0),
        new THREE.CylinderGeometry(0.12, 0.3, 0.12, 12).translate(0, 0.58, 0),
        new THREE.CylinderGeometry(0.55, 0.55, 0.2, 20).translate(0, 0.74, 0),
      ].map(nonIndexed))!;
    case 'caster': {
      const wheel = new THREE.CylinderGeometry(0.42, 0.42, 0.28, 20).rotateZ(Math.PI / 2).translate(0, 1.02, 0);
      return mergeGeometries([
        new THREE.CylinderGeometry(0.12, 0.12, 0.3, 10).translate(0, 0.15, 0),
        new THREE.BoxGeometry(0.9, 0.08, 0.9).translate(0, 0.34, 0),
        new THREE.BoxGeometry(0.5, 0.55, 0.1).translate(0, 0.65, 0.2),
        new THREE.BoxGeometry(0.5, 0.55, 0.1).translate(0, 0.65, -0.2),
        wheel,
      ].map(nonIndexed))!;
    }
    case 'disc':
      return new THREE.CircleGeometry(0.5, 20);
    case 'badge':
      return new THREE.OctahedronGeometry(0.5, 0);
    case 'plane':
      return new THREE.PlaneGeometry(1, 1);
  }
}

function v(x: number, y: number): THREE.Vector2 {
  return new THREE.Vector2(x, y);
}

function centredExtrusion(shape: THREE.Shape): THREE.BufferGeometry {
  return new THREE.ExtrudeGeometry(shape, { depth: 1, bevelEnabled: false }).translate(0, 0, -0.5);
}

/** mergeGeometries needs every part indexed alike; box and cylinder are indexed, so drop the index. */
function nonIndexed(g: THREE.BufferGeometry): THREE.BufferGeometry {
  const out = g.index ? g.toNonIndexed() : g;
  if (out !== g) g.dispose();
  return out;
}

export const BRACKET_LEG_SHARE = BRACKET_LEG;
