import { useEffect, useRef } from 'react';
import { useThree } from '@react-three/fiber';
import * as THREE from 'three';
import type { SequenceStep } from '@/domain/assembly';
import { boundingBoxOf, fitBoxDistance, VIEW_DIRECTIONS } from '../cameraFraming';
import { useScene } from '../sceneContext';
import { createGhostMaterial, StepAnimator } from './StepAnimator';

/** One rendered step picture. */
export interface StepPicture {
  /** 0-based step index. */
  index: number;
  /** The picture as a data URL (JPEG unless asked otherwise). */
  dataUrl: string;
}

interface StepPicturesProps {
  /** The sequence to picture, in order (required; the assembly core's steps). */
  steps: readonly SequenceStep[];
  /** Called with each picture as soon as it is rendered, in step order (required). */
  onPicture: (picture: StepPicture) => void;
  /** Called once after the last picture (default none). */
  onDone?: () => void;
  /** How far the current step's parts are in, 0 (at their explode offset) to 1 (in place); default 0.45. */
  travel?: number;
  /** Image type and quality for `toDataURL` (default JPEG at 0.86). */
  type?: 'image/jpeg' | 'image/png';
  quality?: number;
}

const nextFrame = () => new Promise<void>((resolve) => requestAnimationFrame(() => resolve()));

/**
 * Inside DesignViewer: renders one still picture per step with the exploded-view player's animator
 * (earlier steps in place, the current step's parts part-way along their insertion directions,
 * later steps ghosted), one after another, each read back from the canvas in the same task it was
 * drawn (no preserved drawing buffer needed). For printed instructions. Puts every part back when
 * it unmounts.
 */
export function StepPictures({ steps, onPicture, onDone, travel = 0.45, type = 'image/jpeg', quality = 0.86 }: StepPicturesProps) {
  const { drawn, anchors } = useScene();
  const gl = useThree((s) => s.gl);
  const scene = useThree((s) => s.scene);
  const camera = useThree((s) => s.camera);
  const controls = useThree((s) => s.controls) as unknown as { target: THREE.Vector3; update(): void } | null;
  const callbacks = useRef({ onPicture, onDone });
  callbacks.current = { onPicture, onDone };

  useEffect(() => {
    let cancelled = false;
    const ghost = createGhostMaterial();
    const animator = new StepAnimator(drawn, ghost);
    const run = async () => {
      // Wait for the parts to be drawn and the camera to frame them.
      for (let i = 0; i < 600 && drawn.batches.size === 0 && !cancelled; i++) await nextFrame();
      for (let i = 0; i < 3 && !cancelled; i++) await nextFrame();
      // One camera for every picture: the whole piece from the three-quarter view, with room for
      // the parts still on their way in.
      const box = boundingBoxOf(anchors.current, 'all');
      const direction = VIEW_DIRECTIONS.iso.clone().normalize();
      const perspective = camera as THREE.PerspectiveCamera;
      const distance = box.isEmpty() ? 3000 : fitBoxDistance(box, direction, perspective.fov, perspective.aspect, 0.12);
      const center = box.isEmpty() ? new THREE.Vector3() : box.getCenter(new THREE.Vector3());
      const position = center.clone().addScaledVector(direction, distance);
      for (let index = 0; index < steps.length; index++) {
        if (cancelled) return;
        animator.pose({ steps, stepIndex: index, ghostLater: true, explode: 0, replayNonce: 0 }, travel);
        // Set before every picture: nothing else may have moved the camera between two of them.
        camera.position.copy(position);
        if (controls) {
          controls.target.copy(center);
          controls.update();
        } else camera.lookAt(center);
        camera.updateMatrixWorld();
        gl.render(scene, camera);
        callbacks.current.onPicture({ index, dataUrl: gl.domElement.toDataURL(type, quality) });
        // Let the page paint its progress between pictures.
        await nextFrame();
      }
      if (!cancelled) callbacks.current.onDone?.();
    };
    void run();
    return () => {
      cancelled = true;
      animator.dispose();
      ghost.dispose();
    };
  }, [drawn, anchors, gl, scene, camera, controls, steps, travel, type, quality]);
  return null;
}
