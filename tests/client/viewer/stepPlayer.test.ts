import { describe, expect, it } from 'vitest';
import * as THREE from 'three';
import { StepAnimator, TRAVEL_MS } from '@/components/viewer/player/StepAnimator';
import type { DrawnBatch, DrawnRegistry } from '@/components/viewer/sceneContext';
import { buildSceneLayout } from '@/components/viewer/sceneLayout';
import { sequenceOf } from '@/domain/assembly';
import { defaultCatalogue } from '@/domain/catalogue';
import { enclosureGenerator, generateDesign, tableGenerator } from '@/domain/design/generators';

function registryFor(design: ReturnType<typeof generateDesign>): { drawn: DrawnRegistry; meshes: THREE.InstancedMesh[] } {
  const layout = buildSceneLayout(design, defaultCatalogue);
  const drawn: DrawnRegistry = { batches: new Set<DrawnBatch>(), version: 1 };
  const meshes = layout.batches.map((b) => {
    const mesh = new THREE.InstancedMesh(new THREE.BoxGeometry(), new THREE.MeshBasicMaterial(), b.partIds.length);
    (mesh.instanceMatrix.array as Float32Array).set(b.matrices);
    drawn.batches.add({ object: mesh, partIds: b.partIds, base: b.matrices });
    return mesh;
  });
  return { drawn, meshes };
}

function translationOf(drawn: DrawnRegistry, partId: string): THREE.Vector3 | null {
  for (const batch of drawn.batches) {
    const i = batch.partIds.indexOf(partId);
    if (i < 0) continue;
    const a = (batch.object as THREE.InstancedMesh).instanceMatrix.array;
    if (a[i * 16] === 0 && a[i * 16 + 5] === 0 && a[i * 16 + 10] === 0 && a[i * 16 + 15] === 0) return null; // collapsed
    return new THREE.Vector3(a[i * 16 + 12], a[i * 16 + 13], a[i * 16 + 14]);
  }
  return null;
}

const stepsOf = (design: ReturnType<typeof generateDesign>) => sequenceOf(design, defaultCatalogue).steps;
const distanceOf = (m: { explodeOffset: readonly number[] }) => Math.hypot(...m.explodeOffset);

describe('player steps from the assembly core', () => {
  it('gives every profile, joint, panel and accessory of the enclosure one step and one motion', () => {
    const design = generateDesign('enclosure', { ...enclosureGenerator.defaults }, defaultCatalogue);
    const steps = stepsOf(design);
    const ids = steps.flatMap((s) => s.motions.map((m) => m.partId));
    const expected = [...design.profiles, ...design.joints, ...design.panels, ...design.accessories].map((p) => p.id);
    expect(new Set(ids).size).toBe(ids.length);
    expect(new Set(ids)).toEqual(new Set(expected));
    // Every motion travels a positive distance back along its unit insertion direction.
    for (const m of steps.flatMap((s) => s.motions)) {
      expect(distanceOf(m)).toBeGreaterThan(0);
      expect(Math.hypot(...m.insertionDirection)).toBeCloseTo(1, 6);
      const along = m.explodeOffset.reduce((sum, v, k) => sum + v * m.insertionDirection[k], 0);
      expect(along).toBeCloseTo(-distanceOf(m), 6);
    }
  });
});

describe('the step animator', () => {
  it('keeps earlier steps in place, hides later ones, and brings the current step in along its insertion', () => {
    const design = generateDesign('table', { ...tableGenerator.defaults }, defaultCatalogue);
    const steps = stepsOf(design).filter((s) => s.motions.length > 0);
    expect(steps.length).toBeGreaterThanOrEqual(3);
    const { drawn } = registryFor(design);
    const animator = new StepAnimator(drawn, new THREE.MeshBasicMaterial());
    const view = { steps, stepIndex: steps.length - 1, ghostLater: false, explode: 0, replayNonce: 0 };
    animator.setView(view, 0);
    animator.frame(0);
    const earlier = steps[0].motions[0].partId;
    const seat = translationOf(drawn, earlier)!;
    expect(seat).not.toBeNull();

    // Go to step 2 (index 1): step 1 stays at its seat, step 3's parts are collapsed.
    animator.setView({ ...view, stepIndex: 1 }, 1000);
    animator.frame(1000);
    expect(translationOf(drawn, earlier)!.distanceTo(seat)).toBeLessThan(1e-3);
    expect(translationOf(drawn, steps[2].motions[0].partId)).toBeNull();

    // The current step starts a full offset back along its insertion and ends at its seat.
    const moving = steps[1].motions[0];
    const start = translationOf(drawn, moving.partId)!;
    const end = (animator.frame(1000 + TRAVEL_MS + 10), translationOf(drawn, moving.partId)!);
    const travelled = start.clone().sub(end);
    // The core's explode offset and insertion direction, not a local guess.
    expect(travelled.length()).toBeCloseTo(distanceOf(moving), 0);
    expect(travelled.normalize().dot(new THREE.Vector3(...moving.insertionDirection))).toBeCloseTo(-1, 5);
  });

  it('pushes every placed part out by its offset with the explode slider at full', () => {
    const design = generateDesign('table', { ...tableGenerator.defaults }, defaultCatalogue);
    const steps = stepsOf(design);
    const { drawn } = registryFor(design);
    const animator = new StepAnimator(drawn, new THREE.MeshBasicMaterial());
    const view = { steps, stepIndex: steps.length - 1, ghostLater: true, explode: 0, replayNonce: 0 };
    animator.setView(view, 0);
    animator.frame(0);
    const part = steps[0].motions[0];
    const seat = translationOf(drawn, part.partId)!;
    animator.setView({ ...view, explode: 1 }, 10);
    animator.frame(10);
    expect(translationOf(drawn, part.partId)!.distanceTo(seat)).toBeCloseTo(distanceOf(part), 0);
  });
});

describe('a still step picture', () => {
  it('shows earlier steps in place, the current step part-way along the core’s insertion, and later steps hidden', () => {
    const design = generateDesign('table', { ...tableGenerator.defaults }, defaultCatalogue);
    const steps = stepsOf(design).filter((s) => s.motions.length > 0);
    const { drawn } = registryFor(design);
    const animator = new StepAnimator(drawn, new THREE.MeshBasicMaterial());
    const view = { steps, stepIndex: steps.length - 1, ghostLater: false, explode: 0, replayNonce: 0 };
    animator.pose(view, 1);
    const moving = steps[1].motions[0];
    const seat = translationOf(drawn, moving.partId)!;
    const earlierSeat = translationOf(drawn, steps[0].motions[0].partId)!;
    animator.pose({ ...view, stepIndex: 1 }, 0.25);
    // 25 % of the way in: three quarters of the explode offset remain.
    const at = translationOf(drawn, moving.partId)!;
    expect(at.clone().sub(seat).distanceTo(new THREE.Vector3(...moving.explodeOffset).multiplyScalar(0.75))).toBeLessThan(1e-3);
    expect(translationOf(drawn, steps[0].motions[0].partId)!.distanceTo(earlierSeat)).toBeLessThan(1e-3);
    expect(translationOf(drawn, steps[2].motions[0].partId)).toBeNull();
  });
});
