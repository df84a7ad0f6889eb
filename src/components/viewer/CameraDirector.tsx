import { useEffect, useRef } from 'react';
import { useFrame, useThree } from '@react-three/fiber';
import * as THREE from 'three';
import type { OrbitControls as OrbitControlsImpl } from 'three-stdlib';
import { boundingBoxOf, fitBoxDistance, VIEW_DIRECTIONS } from './cameraFraming';
import { useScene } from './sceneContext';
import type { CameraRequest, ViewName } from './viewerTypes';

/** Length of a camera move, ms: short enough to feel immediate, long enough to follow. */
const MOVE_MS = 320;

interface CameraDirectorProps {
  /** One-shot camera requests from independent sources; each is acted on when its nonce changes (required, may hold nulls). */
  requests: readonly (CameraRequest | null | undefined)[];
  /** When this changes (a new design), everything is framed at once in the three-quarter view (required). */
  frameKey: string | number | null;
}

interface CameraMove {
  fromPosition: THREE.Vector3;
  toPosition: THREE.Vector3;
  fromTarget: THREE.Vector3;
  toTarget: THREE.Vector3;
  startedAt: number;
}

/**
 * Answers camera requests (frame some parts or everything; the named views, front at -Z) with a
 * short eased move, and frames the whole design when `frameKey` changes. Every corner of the
 * framed box is kept inside the view, so an auto-fit never crops the model.
 */
export function CameraDirector({ requests, frameKey }: CameraDirectorProps) {
  const { anchors, aimCamera } = useScene();
  const camera = useThree((s) => s.camera) as THREE.PerspectiveCamera;
  const controls = useThree((s) => s.controls) as unknown as OrbitControlsImpl | null;
  const invalidate = useThree((s) => s.invalidate);
  const size = useThree((s) => s.size);
  const move = useRef<CameraMove | null>(null);
  const aspect = useRef(1);
  aspect.current = size.width / Math.max(1, size.height);
  const frameRef = useRef<((ids: readonly string[] | 'all', view?: ViewName | THREE.Vector3, instant?: boolean) => void) | null>(null);

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
    const frame = (ids: readonly string[] | 'all', view?: ViewName | THREE.Vector3, instant = false) => {
      let box = boundingBoxOf(anchors.current, ids.length === 0 ? 'all' : ids);
      if (box.isEmpty()) box = new THREE.Box3(new THREE.Vector3(-500, 0, -500), new THREE.Vector3(500, 600, 500));
      const direction = view instanceof THREE.Vector3 ? view.clone().normalize() : view ? VIEW_DIRECTIONS[view].clone() : camera.position.clone().sub(controls.target).normalize();
      const distance = fitBoxDistance(box, direction, camera.fov, aspect.current);
      const center = box.getCenter(new THREE.Vector3());
      startMove(center.clone().addScaledVector(direction, distance), center, instant);
    };
    frameRef.current = frame;
    aimCamera.current = (direction) => frame('all', direction);
  }, [controls, camera, anchors, aimCamera, invalidate]);

  const lastNonces = useRef<(number | null)[]>([]);
  useEffect(() => {
    requests.forEach((request, i) => {
      if (!request || request.nonce === lastNonces.current[i]) return;
      lastNonces.current[i] = request.nonce;
      frameRef.current?.(request.ids, request.view, request.instant);
    });
  });

  // Each design opens framed in the three-quarter view; runs after DesignParts has placed its anchors.
  useEffect(() => {
    frameRef.current?.('all', 'iso', true);
  }, [frameKey, controls]);

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
