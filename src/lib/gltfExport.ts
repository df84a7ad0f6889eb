import * as THREE from 'three';
import { GLTFExporter } from 'three/examples/jsm/exporters/GLTFExporter.js';
import { defaultCatalogue, type Catalogue } from '@/domain/catalogue';
import type { DesignDocument } from '@/domain/design/schema';
import { createHardwareGeometry } from '@/components/viewer/hardwareGeometry';
import { createProfileSectionGeometry } from '@/components/viewer/profileSectionGeometry';
import { panelMatrix, profileMatrix } from '@/components/viewer/sceneLayout';

/**
 * The design as a three.js scene for export: one mesh per profile (its own cross-section extruded
 * to length) and per panel, named by part id, in metres (glTF's unit) with Y up. Connectors and
 * fasteners are left out: the file is for seeing the frame, not for manufacturing.
 */
export function designToScene(design: DesignDocument, catalogue: Catalogue = defaultCatalogue): THREE.Scene {
  const scene = new THREE.Scene();
  const root = new THREE.Group();
  root.name = design.name;
  root.scale.setScalar(0.001); // mm → m
  scene.add(root);
  const variants = new Map(catalogue.variants.map((variant) => [variant.id, variant]));
  const sections = new Map<string, THREE.BufferGeometry>();
  const aluminium = new THREE.MeshStandardMaterial({ name: 'anodised aluminium', color: 0xb8bcc2, metalness: 0.6, roughness: 0.4 });
  for (const profile of design.profiles) {
    const variant = variants.get(profile.variantId);
    if (!variant) continue;
    let geometry = sections.get(variant.id);
    if (!geometry) {
      geometry = createProfileSectionGeometry(variant.crossSection);
      sections.set(variant.id, geometry);
    }
    const mesh = new THREE.Mesh(geometry, aluminium);
    mesh.name = profile.id;
    mesh.matrixAutoUpdate = false;
    profileMatrix(profile, mesh.matrix);
    mesh.matrix.decompose(mesh.position, mesh.quaternion, mesh.scale);
    root.add(mesh);
  }
  const sheet = createHardwareGeometry('sheet');
  const panelMaterials = new Map<string, THREE.Material>();
  for (const panel of design.panels ?? []) {
    let material = panelMaterials.get(panel.materialId);
    if (!material) {
      const spec = catalogue.panelMaterials.find((candidate) => candidate.id === panel.materialId);
      material = new THREE.MeshStandardMaterial({ name: panel.materialId, color: spec?.color ?? '#9aa5b1', transparent: (spec?.opacity ?? 1) < 1, opacity: spec?.opacity ?? 1 });
      panelMaterials.set(panel.materialId, material);
    }
    const mesh = new THREE.Mesh(sheet, material);
    mesh.name = panel.id;
    panelMatrix(panel, mesh.matrix);
    mesh.matrix.decompose(mesh.position, mesh.quaternion, mesh.scale);
    root.add(mesh);
  }
  scene.updateMatrixWorld(true);
  return scene;
}

/** glTF binary (.glb) of the design, from three's GLTFExporter. */
export async function designToGlb(design: DesignDocument, catalogue: Catalogue = defaultCatalogue): Promise<ArrayBuffer> {
  const scene = designToScene(design, catalogue);
  const result = await new GLTFExporter().parseAsync(scene, { binary: true });
  return result as ArrayBuffer;
}
