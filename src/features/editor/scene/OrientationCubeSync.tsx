import { useRef, type RefObject } from 'react';
import { useFrame } from '@react-three/fiber';
import * as THREE from 'three';

interface OrientationCubeSyncProps {
  /** The cube element to turn (required; the same ref given to OrientationCube). */
  cubeRef: RefObject<HTMLDivElement | null>;
}

const flipY = new THREE.Matrix4().makeScale(1, -1, 1);
const rotation = new THREE.Matrix4();
const inverse = new THREE.Quaternion();

/** Inside the canvas: on every rendered frame, turns the HTML cube to match the camera (world → view, CSS y down). */
export function OrientationCubeSync({ cubeRef }: OrientationCubeSyncProps) {
  const last = useRef('');
  useFrame(({ camera }) => {
    const el = cubeRef.current;
    if (!el) return;
    rotation.makeRotationFromQuaternion(inverse.copy(camera.quaternion).invert());
    const css = new THREE.Matrix4().multiplyMatrices(flipY, rotation).multiply(flipY);
    const transform = `matrix3d(${css.elements.map((v) => v.toFixed(5)).join(',')})`;
    if (transform !== last.current) {
      el.style.transform = transform;
      last.current = transform;
    }
  });
  return null;
}
