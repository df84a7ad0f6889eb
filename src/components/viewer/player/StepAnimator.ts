/**
 * Moves drawn instances for the exploded-view player, imperatively: earlier steps sit in place
 * (pushed out by the global explode), the current step's parts travel from their explode offsets
 * into place along their insertion directions, later steps are hidden or drawn as ghosts, and a
 * change of build orientation turns the whole piece over. Motions (insertion direction, explode
 * offset) and orientations come from the assembly core's steps. No React: the player's frame hook calls
 * `frame(now)` and invalidates while it returns true. Lengths in mm, times in ms.
 */
import * as THREE from 'three';
import type { BuildOrientation, PartMotion } from '@/domain/assembly';
import type { DrawnBatch, DrawnRegistry } from '../sceneContext';
import type { PlayerView } from './playerTypes';

/** How long one step's parts take to travel into place, ms. */
export const TRAVEL_MS = 900;
/** How long a flip of the whole piece takes, ms. */
export const FLIP_MS = 700;

interface Instance {
  batch: DrawnBatch;
  index: number;
}

const ZERO = new Float32Array(16);

/** The faint material later steps are drawn in when ghosted; the caller disposes it. */
export function createGhostMaterial(): THREE.Material {
  return new THREE.MeshStandardMaterial({ color: '#9fb3c2', transparent: true, opacity: 0.16, depthWrite: false, metalness: 0, roughness: 0.8 });
}
const identity = new THREE.Quaternion();

export class StepAnimator {
  private version = -1;
  private instancesOf = new Map<string, Instance[]>();
  private stepOf = new Map<string, number>();
  private motionOf = new Map<string, PartMotion>();
  private ghosts = new Map<DrawnBatch, THREE.InstancedMesh>();
  private view: PlayerView | null = null;
  private travelStartedAt = 0;
  private flip: { from: THREE.Quaternion; to: THREE.Quaternion; startedAt: number } | null = null;
  private orientation = new THREE.Quaternion();
  private needsFull = true;
  /** True when the piece stands as placed (no turn): matrices are copied, not multiplied. */
  private upright = true;
  private settledStep = -1;
  private readonly center = new THREE.Vector3();
  private readonly orient = new THREE.Matrix4();
  private readonly tmp = new THREE.Matrix4();
  private readonly tmp2 = new THREE.Matrix4();

  constructor(
    private readonly drawn: DrawnRegistry,
    private readonly ghostMaterial: THREE.Material,
    /** Called once when the current step's travel ends (for auto-play). */
    private readonly onSettled: (stepIndex: number) => void = () => {},
  ) {}

  /** The view to show; a new step or replay starts its travel now (after any flip). */
  setView(view: PlayerView, now: number): void {
    const previous = this.view;
    this.view = view;
    this.needsFull = true;
    if (previous && previous.steps !== view.steps) this.version = -1;
    const stepChanged = !previous || previous.stepIndex !== view.stepIndex || previous.replayNonce !== view.replayNonce || previous.steps !== view.steps;
    if (!stepChanged) return;
    const target = orientationOf(view, view.stepIndex);
    if (!this.orientation.equals(target) && previous) {
      this.flip = { from: this.orientation.clone(), to: target, startedAt: now };
      this.travelStartedAt = now + FLIP_MS;
    } else {
      this.orientation.copy(target);
      this.flip = null;
      // The first view opens settled (no travel); later step changes travel in.
      this.travelStartedAt = previous ? now : now - TRAVEL_MS;
    }
    this.settledStep = -1;
  }

  /** Writes this frame's matrices; returns true while something still moves. */
  frame(now: number): boolean {
    const view = this.view;
    if (!view) return false;
    if (this.drawn.version !== this.version) this.rebuildIndex(view);
    let moving = false;
    if (this.flip) {
      const t = Math.min(1, (now - this.flip.startedAt) / FLIP_MS);
      this.orientation.slerpQuaternions(this.flip.from, this.flip.to, easeInOut(t));
      if (t >= 1) this.flip = null;
      else moving = true;
      this.needsFull = true;
    }
    const travel = Math.min(1, Math.max(0, (now - this.travelStartedAt) / TRAVEL_MS));
    const eased = 1 - (1 - travel) ** 3;
    this.updateOrientationMatrix();
    if (this.needsFull) {
      this.writeAll(view, eased);
      this.needsFull = false;
    } else if (travel < 1 || moving) {
      this.writeStep(view, view.stepIndex, eased);
    }
    if (travel < 1) moving = true;
    else if (this.settledStep !== view.stepIndex) {
      this.settledStep = view.stepIndex;
      // Finish the travel exactly in place before reporting.
      this.writeStep(view, view.stepIndex, 1);
      this.onSettled(view.stepIndex);
    }
    return moving;
  }

  /**
   * One travelling frame, mid-way, of the step with the most parts (the worst case, for the
   * frame-time benchmark); the next frame rewrites every instance.
   */
  probeFrame(): void {
    const view = this.view;
    if (!view) return;
    if (this.drawn.version !== this.version) this.rebuildIndex(view);
    let largest = view.stepIndex;
    view.steps.forEach((step, i) => {
      if (step.motions.length > (view.steps[largest]?.motions.length ?? 0)) largest = i;
    });
    this.updateOrientationMatrix();
    this.writeStep(view, largest, 0.5);
    this.needsFull = true;
  }

  /**
   * A still picture of `view`: the piece in the current step's orientation (no flip), earlier
   * steps in place, the current step's parts `travel` of the way in (0 = at their explode offset,
   * 1 = in place). For step pictures rendered one after another.
   */
  pose(view: PlayerView, travel: number): void {
    this.view = view;
    if (this.drawn.version !== this.version) this.rebuildIndex(view);
    this.orientation.copy(orientationOf(view, view.stepIndex));
    this.flip = null;
    this.travelStartedAt = Number.NEGATIVE_INFINITY;
    this.settledStep = view.stepIndex;
    this.updateOrientationMatrix();
    this.writeAll(view, Math.min(1, Math.max(0, travel)));
    this.needsFull = false;
  }

  /** Removes ghosts and puts every instance back where the layout put it. */
  dispose(): void {
    for (const ghost of this.ghosts.values()) {
      ghost.removeFromParent();
      ghost.dispose();
    }
    this.ghosts.clear();
    for (const batch of this.drawn.batches) {
      const object = batch.object as THREE.InstancedMesh;
      if (object.isInstancedMesh) {
        (object.instanceMatrix.array as Float32Array).set(batch.base.subarray(0, object.instanceMatrix.array.length));
        object.instanceMatrix.needsUpdate = true;
        object.frustumCulled = true;
      } else {
        object.matrix.fromArray(batch.base);
        object.visible = true;
        object.matrixWorldNeedsUpdate = true;
      }
    }
  }

  private rebuildIndex(view: PlayerView): void {
    this.version = this.drawn.version;
    this.instancesOf.clear();
    this.stepOf.clear();
    this.motionOf.clear();
    view.steps.forEach((step, s) => {
      for (const partId of step.partIds) if (!this.stepOf.has(partId)) this.stepOf.set(partId, s);
      for (const motion of step.motions) this.motionOf.set(motion.partId, motion);
    });
    const box = new THREE.Box3();
    const p = new THREE.Vector3();
    for (const batch of this.drawn.batches) {
      batch.partIds.forEach((partId, index) => {
        let list = this.instancesOf.get(partId);
        if (!list) this.instancesOf.set(partId, (list = []));
        list.push({ batch, index });
        box.expandByPoint(p.set(batch.base[index * 16 + 12], batch.base[index * 16 + 13], batch.base[index * 16 + 14]));
      });
      // Instances leave the laid-out bounds while exploded: never cull the whole batch for that.
      batch.object.frustumCulled = false;
    }
    if (!box.isEmpty()) box.getCenter(this.center);
    for (const [batch, ghost] of this.ghosts) {
      if (!this.drawn.batches.has(batch)) {
        ghost.removeFromParent();
        ghost.dispose();
        this.ghosts.delete(batch);
      }
    }
    this.needsFull = true;
  }

  private updateOrientationMatrix(): void {
    this.upright = this.orientation.equals(identity);
    if (this.upright) {
      this.orient.identity();
      return;
    }
    // Turn about the piece's centre: T(c) · R · T(-c).
    this.orient.makeTranslation(this.center.x, this.center.y, this.center.z);
    this.tmp.makeRotationFromQuaternion(this.orientation);
    this.orient.multiply(this.tmp);
    this.tmp.makeTranslation(-this.center.x, -this.center.y, -this.center.z);
    this.orient.multiply(this.tmp);
  }

  /** Every instance of every batch: placed, travelling, hidden or ghosted. */
  private writeAll(view: PlayerView, eased: number): void {
    const ghostCounts = new Map<DrawnBatch, number>();
    for (const batch of this.drawn.batches) {
      const object = batch.object as THREE.InstancedMesh;
      const instanced = object.isInstancedMesh === true;
      let ghostCount = 0;
      const ghost = view.ghostLater && instanced ? this.ghostFor(batch, object) : null;
      for (let i = 0; i < batch.partIds.length; i++) {
        const partId = batch.partIds[i];
        const step = this.stepOf.get(partId) ?? -1;
        if (step > view.stepIndex) {
          this.writeInstance(batch, i, null);
          if (ghost) {
            this.composed(batch.base, i, 0, null);
            ghost.setMatrixAt(ghostCount++, this.tmp2);
          }
          continue;
        }
        const factor = step === view.stepIndex ? Math.max(view.explode, 1 - eased) : view.explode;
        this.writeInstance(batch, i, factor === 0 ? null : this.motionOf.get(partId) ?? null, factor);
      }
      if (instanced) object.instanceMatrix.needsUpdate = true;
      ghostCounts.set(batch, ghostCount);
    }
    for (const [batch, ghost] of this.ghosts) {
      const count = view.ghostLater ? ghostCounts.get(batch) ?? 0 : 0;
      ghost.count = count;
      ghost.visible = count > 0;
      ghost.instanceMatrix.needsUpdate = true;
    }
  }

  /** Only the instances of one step (the frame-by-frame path while its parts travel). */
  private writeStep(view: PlayerView, stepIndex: number, eased: number): void {
    const step = view.steps[stepIndex];
    if (!step) return;
    const factor = Math.max(view.explode, 1 - eased);
    for (const motion of step.motions) {
      const list = this.instancesOf.get(motion.partId);
      if (!list) continue;
      for (let k = 0; k < list.length; k++) this.writeInstance(list[k].batch, list[k].index, factor === 0 ? null : motion, factor);
    }
    for (const batch of this.drawn.batches) {
      const mesh = batch.object as THREE.InstancedMesh;
      if (mesh.isInstancedMesh) mesh.instanceMatrix.needsUpdate = true;
    }
  }

  /**
   * Writes instance `i` of a batch: at its seat pushed back along its insertion by `factor` of its
   * offset, turned with the piece; `hidden` (motion null and factor undefined) collapses it.
   */
  private writeInstance(batch: DrawnBatch, i: number, motion: PartMotion | null, factor?: number): void {
    const object = batch.object as THREE.InstancedMesh;
    const hidden = factor === undefined;
    if (!object.isInstancedMesh) {
      object.visible = !hidden;
      if (hidden) return;
      this.composed(batch.base, i, factor ?? 0, motion);
      object.matrix.copy(this.tmp2);
      object.matrixWorldNeedsUpdate = true;
      return;
    }
    const array = object.instanceMatrix.array as Float32Array;
    if (hidden) {
      array.set(ZERO, i * 16);
      return;
    }
    if (this.upright) {
      // The common path, no allocation: copy the seat and push the translation back.
      const base = batch.base;
      const o = i * 16;
      for (let k = 0; k < 16; k++) array[o + k] = base[o + k];
      if (motion && factor) {
        // explodeOffset = -insertionDirection x distance (mm): the part starts there and travels in.
        array[o + 12] += motion.explodeOffset[0] * factor;
        array[o + 13] += motion.explodeOffset[1] * factor;
        array[o + 14] += motion.explodeOffset[2] * factor;
      }
      return;
    }
    this.composed(batch.base, i, factor ?? 0, motion);
    array.set(this.tmp2.elements, i * 16);
  }

  /** tmp2 = orientation · translate(explodeOffset · factor) · base[i]. */
  private composed(base: Float32Array, i: number, factor: number, motion: PartMotion | null): void {
    const m = this.tmp2.fromArray(base, i * 16);
    if (motion && factor > 0) {
      m.elements[12] += motion.explodeOffset[0] * factor;
      m.elements[13] += motion.explodeOffset[1] * factor;
      m.elements[14] += motion.explodeOffset[2] * factor;
    }
    if (!this.upright) m.premultiply(this.orient);
  }

  private ghostFor(batch: DrawnBatch, mesh: THREE.InstancedMesh): THREE.InstancedMesh {
    let ghost = this.ghosts.get(batch);
    if (ghost && ghost.instanceMatrix.count < batch.partIds.length) {
      ghost.removeFromParent();
      ghost.dispose();
      ghost = undefined;
    }
    if (!ghost) {
      ghost = new THREE.InstancedMesh(mesh.geometry, this.ghostMaterial, Math.max(1, batch.partIds.length));
      ghost.name = `ghost:${mesh.name}`;
      ghost.frustumCulled = false;
      ghost.raycast = () => {};
      ghost.renderOrder = 2;
      this.ghosts.set(batch, ghost);
    }
    if (ghost.parent !== mesh.parent && mesh.parent) mesh.parent.add(ghost);
    return ghost;
  }
}

/**
 * Build orientations as turns of the whole piece about its centre (Y up, front -Z): the core says
 * how the piece lies while a step is done; the player turns it so the step reads as built.
 */
const TURNS: Record<BuildOrientation, { axis: [number, number, number]; angleDeg: number } | null> = {
  'as-placed': null,
  // Back (+Z) down: a quarter turn about X.
  'lying-on-back': { axis: [1, 0, 0], angleDeg: 90 },
  'upside-down': { axis: [1, 0, 0], angleDeg: 180 },
  'on-side': { axis: [0, 0, 1], angleDeg: 90 },
};

function orientationOf(view: PlayerView, stepIndex: number): THREE.Quaternion {
  const turn = TURNS[view.steps[stepIndex]?.orientation ?? 'as-placed'];
  if (!turn) return new THREE.Quaternion();
  return new THREE.Quaternion().setFromAxisAngle(new THREE.Vector3(...turn.axis).normalize(), THREE.MathUtils.degToRad(turn.angleDeg));
}

function easeInOut(t: number): number {
  return t < 0.5 ? 2 * t * t : 1 - (-2 * t + 2) ** 2 / 2;
}
