import { describe, expect, it } from 'vitest';
import * as THREE from 'three';
import { boundingBoxOf, fitBoxDistance, VIEW_DIRECTIONS } from '@/components/viewer/cameraFraming';
import { buildSceneLayout } from '@/components/viewer/sceneLayout';
import { defaultCatalogue } from '@/domain/catalogue';
import { generateDesign, tableGenerator } from '@/domain/design/generators';

const tableGeneratorDefaults = () => ({ ...tableGenerator.defaults });

// Slotwise's camera convention (our own rule, DEVELOPERS.md "The viewer layer"): front is -Z,
// left is -X, right is +X, Y is up — the same axes the design format and the frame starters use.

function cameraFor(view: keyof typeof VIEW_DIRECTIONS, target: THREE.Vector3, distance: number, aspect = 1.6): THREE.PerspectiveCamera {
  const camera = new THREE.PerspectiveCamera(40, aspect, 5, 120_000);
  camera.position.copy(target).addScaledVector(VIEW_DIRECTIONS[view], distance);
  camera.up.set(0, 1, 0);
  camera.lookAt(target);
  camera.updateMatrixWorld();
  return camera;
}

describe('the camera convention', () => {
  it('puts the front camera on the -Z side and the back camera on the +Z side', () => {
    expect(VIEW_DIRECTIONS.front.z).toBeLessThan(-0.99);
    expect(VIEW_DIRECTIONS.back.z).toBeGreaterThan(0.99);
    expect(VIEW_DIRECTIONS.left.x).toBeLessThan(-0.99);
    expect(VIEW_DIRECTIONS.right.x).toBeGreaterThan(0.99);
    expect(VIEW_DIRECTIONS.top.y).toBeGreaterThan(0.99);
    // The three-quarter view looks from the front and from above.
    expect(VIEW_DIRECTIONS.iso.z).toBeLessThan(0);
    expect(VIEW_DIRECTIONS.iso.y).toBeGreaterThan(0);
  });

  it('shows a starter table front rail nearer the front camera than its back rail', () => {
    const design = generateDesign('table', tableGeneratorDefaults(), defaultCatalogue);
    const front = design.profiles.find((p) => /front/i.test(p.label ?? '') && p.direction[0] !== 0);
    const back = design.profiles.find((p) => /back/i.test(p.label ?? '') && p.direction[0] !== 0);
    expect(front, 'the table starter names a front rail').toBeDefined();
    expect(back, 'the table starter names a back rail').toBeDefined();
    const camera = cameraFor('front', new THREE.Vector3(0, 400, 0), 3000);
    const distance = (p: NonNullable<typeof front>) => camera.position.distanceTo(new THREE.Vector3(...p.start));
    expect(distance(front!)).toBeLessThan(distance(back!));
  });

  it('keeps the top view with the front edge at the bottom of the screen', () => {
    const camera = cameraFor('top', new THREE.Vector3(0, 0, 0), 3000);
    const frontPoint = new THREE.Vector3(0, 0, -400).project(camera);
    const backPoint = new THREE.Vector3(0, 0, 400).project(camera);
    expect(frontPoint.y).toBeLessThan(backPoint.y);
  });
});

describe('auto-fit', () => {
  it('keeps every corner of a long, low frame inside the view after fitting, for each named view', () => {
    const design = generateDesign('table', { ...tableGeneratorDefaults(), width: 3000, depth: 600, height: 450 }, defaultCatalogue);
    const layout = buildSceneLayout(design, defaultCatalogue);
    const box = boundingBoxOf(layout.anchors, 'all');
    const center = box.getCenter(new THREE.Vector3());
    for (const view of Object.keys(VIEW_DIRECTIONS) as (keyof typeof VIEW_DIRECTIONS)[]) {
      for (const aspect of [0.46, 1, 1.78]) {
        const distance = fitBoxDistance(box, VIEW_DIRECTIONS[view], 40, aspect);
        const camera = cameraFor(view, center, distance, aspect);
        let widest = 0;
        for (let i = 0; i < 8; i++) {
          const corner = new THREE.Vector3(i & 1 ? box.max.x : box.min.x, i & 2 ? box.max.y : box.min.y, i & 4 ? box.max.z : box.min.z).project(camera);
          widest = Math.max(widest, Math.abs(corner.x), Math.abs(corner.y));
        }
        expect(widest, `${view} at aspect ${aspect}`).toBeLessThanOrEqual(1);
        // ...and fills the view: not fitted so far away that the model is a speck.
        expect(widest, `${view} at aspect ${aspect}`).toBeGreaterThan(0.75);
      }
    }
  });
});
