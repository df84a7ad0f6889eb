import { useEffect, useRef } from 'react';
import { useFrame, useThree } from '@react-three/fiber';
import * as THREE from 'three';
import type { OrbitControls as OrbitControlsImpl } from 'three-stdlib';
import { useEditorStore, useEditorStoreApi, type EditorView } from '../store/editorStore';
import { boundingSphereOf, fitDistance, VIEW_DIRECTIONS } from './cameraFraming';
import { useScene } from './sceneContext';

/** Length of a camera move, ms: short enough to feel immediate, long enough to follow. */
const MOVE_MS = 320;

interface CameraMove {
  fromPosition: THREE.Vector3;
  toPosition: THREE.Vector3;
  fromTarget: THREE.Vector3;
  toTarget: THREE.Vector3;
  startedAt: number;
}

/**
 * Answers the store's one-shot camera requests (frame the selection or everything; front, top,
 * side, iso views) with a short eased move, and frames the whole design when a design loads.
 * Takes no props.
 */
export function CameraDirector() {
  const store = useEditorStoreApi();
  const { anchors, aimCamera } = useScene();
  const camera = useThree((s) => s.camera) as THREE.PerspectiveCamera;
  const controls = useThree((s) => s.controls) as unknown as OrbitControlsImpl | null;
  const invalidate = useThree((s) => s.invalidate);
  const size = useThree((s) => s.size);
  const designId = useEditorStore((s) => s.designId);
  const move = useRef<CameraMove | null>(null);
  const aspect = useRef(1);
  aspect.current = size.width / Math.max(1, size.height);
  const frameRef = useRef<((ids: string[] | 'all', view?: EditorView | THREE.Vector3, instant?: boolean) => void) | null>(null);

  useEffect(() => {
    if (!controls) return;
    const startMove = (toPosition: THREE.Vector3, toTarget: THREE.Vector3, instant: boolean) => {
      if (instant) {
        move.current = null;
        camera.position.copy(toPosition);
        controls.target.copy(toTarget);
        controls.update();
        invalidate();
        return;
      }
      move.current = { fromPosition: camera.position.clone(), toPosition, fromTarget: controls.target.clone(), toTarget, startedAt: performance.now() };
      invalidate();
    };
    const frame = (ids: string[] | 'all', view?: EditorView | THREE.Vector3, instant = false) => {
      const sphere = boundingSphereOf(anchors.current, ids.length === 0 ? 'all' : ids);
      const direction = view instanceof THREE.Vector3 ? view.clone().normalize() : view ? VIEW_DIRECTIONS[view].clone() : camera.position.clone().sub(controls.target).normalize();
      const distance = fitDistance(sphere, camera.fov, aspect.current);
      startMove(sphere.center.clone().addScaledVector(direction, distance), sphere.center.clone(), instant);
    };
    frameRef.current = frame;
    aimCamera.current = (direction) => frame('all', direction);
    return store.subscribe((state, previous) => {
      if (state.frameRequest && state.frameRequest !== previous.frameRequest) frame(state.frameRequest.ids);
      if (state.viewRequest && state.viewRequest !== previous.viewRequest) frame('all', state.viewRequest.view);
    });
  }, [store, controls, camera, anchors, aimCamera, invalidate]);

  // Each loaded design opens framed in the iso view; runs after DesignParts has placed its anchors.
  useEffect(() => {
    frameRef.current?.('all', 'iso', true);
  }, [designId, controls]);

  useFrame(() => {
    const m = move.current;
    if (!m || !controls) return;
    const t = Math.min(1, (performance.now() - m.startedAt) / MOVE_MS);
    const eased = 1 - (1 - t) ** 3;
    camera.position.lerpVectors(m.fromPosition, m.toPosition, eased);
    controls.target.lerpVectors(m.fromTarget, m.toTarget, eased);
    controls.update();
    if (t < 1) invalidate();
    else move.current = null;
  });

  return null;
}
