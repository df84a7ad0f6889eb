import { useRef } from 'react';
import { useFrame, useThree } from '@react-three/fiber';
import * as THREE from 'three';
import type { OrbitControls as OrbitControlsImpl } from 'three-stdlib';
import { useScene } from './sceneContext';

interface LevelOfDetailProps {
  /** Number of profiles in the design (required): large designs switch to the light sections sooner. */
  profileCount: number;
}

/** On-screen size of a 40 mm section (px) below which profiles draw their light section. */
const FAR_PX = 7;
/** ...and for designs of more than LARGE profiles, where the full sections cost most. */
const LARGE_FAR_PX = 16;
const LARGE = 800;

/**
 * Level of detail, decided on each rendered frame from how big a typical section appears: when a
 * design is far (or large and moderately far) its profiles swap to the light cross-section and
 * the small hardware (screws, T-nuts, machining marks; connectors too on large designs) is not drawn. Swaps geometry on the
 * instanced meshes imperatively; nothing re-renders.
 */
export function LevelOfDetail({ profileCount }: LevelOfDetailProps) {
  const { drawn, resources } = useScene();
  const controls = useThree((s) => s.controls) as unknown as OrbitControlsImpl | null;
  const light = useRef<boolean | null>(null);
  const version = useRef(-1);

  useFrame(({ camera, size, invalidate }) => {
    const perspective = camera as THREE.PerspectiveCamera;
    const target = controls?.target ?? new THREE.Vector3();
    const distance = Math.max(1, perspective.position.distanceTo(target));
    const px = (40 * size.height) / (2 * distance * Math.tan(THREE.MathUtils.degToRad(perspective.fov ?? 40) / 2));
    const wantLight = px < (profileCount > LARGE ? LARGE_FAR_PX : FAR_PX);
    if (wantLight === light.current && drawn.version === version.current) return;
    light.current = wantLight;
    version.current = drawn.version;
    for (const batch of drawn.batches) {
      const mesh = batch.object as THREE.InstancedMesh;
      if (!mesh.isInstancedMesh) continue;
      const [role, geometryKey] = mesh.name.replace(/^batch:/, '').split('|');
      if (role === 'profile' && geometryKey?.startsWith('profile:')) {
        const full = (mesh.userData.fullGeometry as THREE.BufferGeometry | undefined) ?? mesh.geometry;
        mesh.userData.fullGeometry = full;
        const lighter = resources.lightProfileGeometry(geometryKey.slice('profile:'.length));
        mesh.geometry = wantLight && lighter ? lighter : full;
      } else if (role === 'fastener' || role === 'machining' || (role === 'connector' && profileCount > LARGE)) {
        // A few pixels across at this distance: the frame reads the same without them.
        mesh.visible = !wantLight;
      }
    }
    invalidate();
  });
  return null;
}
