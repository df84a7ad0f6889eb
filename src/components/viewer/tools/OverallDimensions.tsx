import { Html, Line } from '@react-three/drei';
import { useMemo } from 'react';
import * as THREE from 'three';
import { formatLength, type LengthUnit } from '@/domain/units';
import { boundingBoxOf } from '../cameraFraming';
import { useScene } from '../sceneContext';

type Point = [number, number, number];

function Dimension({ from, to, label }: { from: Point; to: Point; label: string }) {
  const middle: Point = [(from[0] + to[0]) / 2, (from[1] + to[1]) / 2, (from[2] + to[2]) / 2];
  return (
    <group>
      <Line points={[from, to]} color="#1f4e79" lineWidth={1.5} />
      <Html position={middle} center zIndexRange={[15, 0]}>
        <span className="whitespace-nowrap rounded bg-paper-raised/90 px-1.5 py-0.5 text-xs font-semibold text-ink shadow-sm" data-testid="dimension-label">
          {label}
        </span>
      </Html>
    </group>
  );
}

/**
 * Overall width (X), height (Y) and depth (Z) drawn along the design's box, offset out of the
 * frame, plus the length of each selected profile, in the viewer's units.
 */
export function OverallDimensions({ units, selectedLengths = [], designKey }: { units: LengthUnit; selectedLengths?: { id: string; length: number }[]; designKey: unknown }) {
  const { anchors } = useScene();
  // The anchors live in a ref that the scene refills per design: designKey says when to measure again.
  const box = useMemo(() => (designKey === undefined ? new THREE.Box3() : boundingBoxOf(anchors.current, 'all')), [anchors, designKey]);
  if (box.isEmpty()) return null;
  const size = box.getSize(new THREE.Vector3());
  const gap = Math.max(40, size.length() * 0.04);
  const { min, max } = box;
  return (
    <group>
      <Dimension from={[min.x, min.y, min.z - gap]} to={[max.x, min.y, min.z - gap]} label={`W ${formatLength(size.x, units)}`} />
      <Dimension from={[max.x + gap, min.y, min.z - gap]} to={[max.x + gap, max.y, min.z - gap]} label={`H ${formatLength(size.y, units)}`} />
      <Dimension from={[max.x + gap, min.y, min.z]} to={[max.x + gap, min.y, max.z]} label={`D ${formatLength(size.z, units)}`} />
      {selectedLengths.map(({ id, length }) => {
        const anchor = anchors.current.get(id);
        if (!anchor) return null;
        return (
          <Html key={id} position={anchor.center} center zIndexRange={[15, 0]}>
            <span className="whitespace-nowrap rounded bg-accent px-1.5 py-0.5 text-xs font-semibold text-accent-ink shadow">{formatLength(length, units)}</span>
          </Html>
        );
      })}
    </group>
  );
}
