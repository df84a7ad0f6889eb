import { useEffect, useRef } from 'react';
import { useThree } from '@react-three/fiber';
import type { SequenceStep } from '@/domain/assembly';
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
  const { drawn } = useScene();
  const gl = useThree((s) => s.gl);
  const scene = useThree((s) => s.scene);
  const camera = useThree((s) => s.camera);
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
      for (let index = 0; index < steps.length; index++) {
        if (cancelled) return;
        animator.pose({ steps, stepIndex: index, ghostLater: true, explode: 0, replayNonce: 0 }, travel);
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
  }, [drawn, gl, scene, camera, steps, travel, type, quality]);
  return null;
}
