import { Html, Line } from '@react-three/drei';
import { useThree } from '@react-three/fiber';
import { useEffect, useState } from 'react';
import { formatLength, type LengthUnit } from '@/domain/units';
import { usePointPick } from './usePointPick';

type Point = [number, number, number];

/** Distance between two points, mm. */
export function distanceMm(a: Point, b: Point): number {
  return Math.hypot(a[0] - b[0], a[1] - b[1], a[2] - b[2]);
}

/**
 * Measure between two picked points on parts: the first click sets A, the second B and shows
 * the straight distance in the viewer's units; a third click starts again.
 */
export function MeasureTool({ enabled, units, onMeasure }: { enabled: boolean; units: LengthUnit; onMeasure?: (mm: number | null) => void }) {
  const [points, setPoints] = useState<Point[]>([]);
  const { invalidate } = useThree();
  usePointPick(enabled, ({ point }) => setPoints((current) => (current.length >= 2 ? [point] : [...current, point])));
  useEffect(() => {
    if (!enabled) setPoints([]);
  }, [enabled]);
  useEffect(() => {
    onMeasure?.(points.length === 2 ? distanceMm(points[0], points[1]) : null);
    invalidate();
  }, [points, onMeasure, invalidate]);
  if (!enabled || points.length === 0) return null;
  const [a, b] = points;
  return (
    <group>
      {points.map((point, index) => (
        <mesh key={index} position={point} renderOrder={10}>
          <sphereGeometry args={[6, 16, 12]} />
          <meshBasicMaterial color="#d9480f" depthTest={false} />
        </mesh>
      ))}
      {b && (
        <>
          <Line points={[a, b]} color="#d9480f" lineWidth={2} depthTest={false} />
          <Html position={[(a[0] + b[0]) / 2, (a[1] + b[1]) / 2, (a[2] + b[2]) / 2]} center zIndexRange={[20, 0]}>
            <span data-testid="measure-label" className="whitespace-nowrap rounded bg-ink px-2 py-1 text-xs font-semibold text-paper shadow">
              {formatLength(distanceMm(a, b), units)}
            </span>
          </Html>
        </>
      )}
    </group>
  );
}
