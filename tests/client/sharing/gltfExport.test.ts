// @vitest-environment jsdom
import * as THREE from 'three';
import { GLTFLoader } from 'three/examples/jsm/loaders/GLTFLoader.js';
import { describe, expect, it } from 'vitest';
import { demoDesigns } from '@/domain/fixtures';
import { designToGlb, designToScene } from '@/lib/gltfExport';

const meshesOf = (root: THREE.Object3D) => {
  const meshes: THREE.Mesh[] = [];
  root.traverse((object) => {
    if ((object as THREE.Mesh).isMesh) meshes.push(object as THREE.Mesh);
  });
  return meshes;
};

describe('glTF binary export', () => {
  it.each(demoDesigns.map((design) => [design.name, design] as const))('"%s" loads back in GLTFLoader with the same meshes, named by part, at true size in metres', async (_name, design) => {
    const scene = designToScene(design);
    const exported = meshesOf(scene);
    expect(exported.length).toBe(design.profiles.length + (design.panels?.length ?? 0));
    const glb = await designToGlb(design);
    expect(new TextDecoder().decode(new Uint8Array(glb, 0, 4))).toBe('glTF'); // GLB header magic, glTF 2.0 spec §4.4.2
    const loaded = await new GLTFLoader().parseAsync(glb, '');
    const meshes = meshesOf(loaded.scene);
    expect(meshes.length).toBe(exported.length);
    expect(meshes.map((mesh) => mesh.name).sort()).toEqual(exported.map((mesh) => mesh.name).sort());
    // The loaded frame's height equals the tallest profile top in the document (mm → m).
    const box = new THREE.Box3().setFromObject(loaded.scene);
    const topMm = Math.max(...design.profiles.map((profile) => Math.max(profile.start[1], profile.start[1] + profile.direction[1] * profile.length)));
    expect(box.max.y).toBeGreaterThan(topMm / 1000 - 0.001);
    expect(box.max.y).toBeLessThan(topMm / 1000 + 0.1);
  });
});
