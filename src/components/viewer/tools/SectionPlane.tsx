import { useEffect } from 'react';
import { useThree } from '@react-three/fiber';
import * as THREE from 'three';

export type SectionAxis = 'x' | 'y' | 'z';

const NORMALS: Record<SectionAxis, THREE.Vector3> = {
  x: new THREE.Vector3(-1, 0, 0),
  y: new THREE.Vector3(0, -1, 0),
  z: new THREE.Vector3(0, 0, -1),
};

/**
 * A section view: one clipping plane across an axis at `offset` mm; everything beyond it is cut
 * away (kept: the side toward the negative axis). Off when `axis` is null.
 */
export function SectionPlane({ axis, offset }: { axis: SectionAxis | null; offset: number }) {
  const { gl, invalidate } = useThree();
  useEffect(() => {
    if (!axis) {
      gl.clippingPlanes = [];
    } else {
      // Keeps points with normal·p + constant ≥ 0, i.e. coordinate ≤ offset.
      gl.clippingPlanes = [new THREE.Plane(NORMALS[axis].clone(), offset)];
    }
    invalidate();
    return () => {
      gl.clippingPlanes = [];
      invalidate();
    };
  }, [axis, offset, gl, invalidate]);
  return null;
}
