import { useEffect, useMemo } from 'react';
import { useFrame, useThree } from '@react-three/fiber';
import * as THREE from 'three';
import type { DesignDocument } from '@/domain/design/schema';
import type { LengthUnit } from '@/domain/units';
import { gridStepsFor } from './gridSteps';

interface UnitGridProps {
  /** The design the grid spreads under (required). */
  design: DesignDocument;
  /** Grid units: 10/100 mm or 1/12 in (required). */
  units: LengthUnit;
  /** Smallest half size of the grid, mm; it grows to cover the design, in whole major steps (default 2000). */
  minHalfExtent?: number;
}

/**
 * The floor grid in the designer's units: fine lines every 10 mm / 1 in, strong lines every
 * 100 mm / 12 in, and the two floor axes in the accent colour. Three draw calls in all.
 */
export function UnitGrid({ design, units, minHalfExtent = 2000 }: UnitGridProps) {
  const halfExtent = useMemo(() => {
    let reach = minHalfExtent;
    for (const p of design.profiles) {
      for (const i of [0, 2]) reach = Math.max(reach, Math.abs(p.start[i]) * 1.25, Math.abs(p.start[i] + p.direction[i] * p.length) * 1.25);
    }
    return Math.min(reach, 12000);
  }, [design, minHalfExtent]);
  const invalidate = useThree((s) => s.invalidate);
  const { minor, major } = gridStepsFor(units);
  const half = Math.ceil(halfExtent / major) * major;

  const lines = useMemo(() => {
    const minorLines = gridLines(half, minor, major, false);
    const majorLines = gridLines(half, major, 0, true);
    const axes = new THREE.BufferGeometry().setAttribute('position', new THREE.Float32BufferAttribute([-half, 0, 0, half, 0, 0, 0, 0, -half, 0, 0, half], 3));
    return { minorLines, majorLines, axes };
  }, [half, minor, major]);

  const materials = useMemo(
    () => ({
      minor: new THREE.LineBasicMaterial({ color: '#b8c0bc', transparent: true, opacity: 0.28, depthWrite: false }),
      major: new THREE.LineBasicMaterial({ color: '#8f9994', transparent: true, opacity: 0.7, depthWrite: false }),
      axes: new THREE.LineBasicMaterial({ color: '#0b7a75', transparent: true, opacity: 0.85, depthWrite: false }),
    }),
    [],
  );

  useEffect(() => {
    invalidate();
    return () => {
      lines.minorLines.dispose();
      lines.majorLines.dispose();
      lines.axes.dispose();
    };
  }, [lines, invalidate]);
  useEffect(() => () => Object.values(materials).forEach((m) => m.dispose()), [materials]);

  // Fine lines fade out as they crowd together on screen (closer than ~6 px), so the far floor stays calm.
  const controls = useThree((s) => s.controls) as unknown as { target: THREE.Vector3 } | null;
  useFrame(({ camera, size }) => {
    const distance = controls ? camera.position.distanceTo(controls.target) : camera.position.length();
    const pxPerMinor = (minor * size.height) / (2 * distance * Math.tan(THREE.MathUtils.degToRad((camera as THREE.PerspectiveCamera).fov ?? 40) / 2));
    const opacity = THREE.MathUtils.clamp((pxPerMinor - 4) / 8, 0, 1) * 0.3;
    materials.minor.opacity = opacity;
    materials.minor.visible = opacity > 0.01;
  });

  return (
    <group name="unit-grid" renderOrder={-1}>
      <lineSegments geometry={lines.minorLines} material={materials.minor} raycast={() => null} />
      <lineSegments geometry={lines.majorLines} material={materials.major} raycast={() => null} />
      <lineSegments geometry={lines.axes} material={materials.axes} raycast={() => null} position={[0, 0.05, 0]} />
    </group>
  );
}

/** Lines on the floor (y = 0) every `step` mm across ±half, skipping those every `skipEvery` (drawn stronger elsewhere). */
function gridLines(half: number, step: number, skipEvery: number, skipOrigin: boolean): THREE.BufferGeometry {
  const positions: number[] = [];
  const count = Math.round(half / step);
  for (let i = -count; i <= count; i++) {
    const at = i * step;
    if (skipEvery > 0 && Math.abs(at / skipEvery - Math.round(at / skipEvery)) < 1e-6) continue;
    if (skipOrigin && i === 0) continue;
    positions.push(-half, 0, at, half, 0, at, at, 0, -half, at, 0, half);
  }
  return new THREE.BufferGeometry().setAttribute('position', new THREE.Float32BufferAttribute(positions, 3));
}
