/**
 * A variant's cross-section (outline and holes, mm, centred on the origin) extruded once to unit
 * length along +z. Every profile of that variant shares it; the instance matrix stretches z to
 * the profile's length.
 */
import * as THREE from 'three';
import { mergeVertices } from 'three/examples/jsm/utils/BufferGeometryUtils.js';
import type { CrossSection } from '@/domain/catalogue';

export function sectionShape(section: CrossSection): THREE.Shape {
  const shape = new THREE.Shape(section.outline.map(([x, y]) => new THREE.Vector2(x, y)));
  for (const hole of section.holes) shape.holes.push(new THREE.Path(hole.map(([x, y]) => new THREE.Vector2(x, y))));
  return shape;
}

export function createProfileSectionGeometry(section: CrossSection): THREE.BufferGeometry {
  const extruded = new THREE.ExtrudeGeometry(sectionShape(section), { depth: 1, bevelEnabled: false, steps: 1, curveSegments: 1 });
  // Indexed, so thousands of instances share vertex work where faces meet (software WebGL is vertex-bound).
  const geometry = mergeVertices(extruded);
  extruded.dispose();
  // Picking rejects most instances on this box before testing triangles.
  geometry.computeBoundingBox();
  geometry.computeBoundingSphere();
  return geometry;
}
