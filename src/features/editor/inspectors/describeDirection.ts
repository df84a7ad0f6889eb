import type { Vec3 } from '@/domain/design/schema';

const AXIS_NAMES = ['X (left–right)', 'Y (up–down)', 'Z (front–back)'] as const;

/** "along +X (left–right)" for axis-aligned directions, else the vector. */
export function describeDirection(direction: Vec3): string {
  const index = direction.findIndex((component) => Math.abs(Math.abs(component) - 1) < 1e-9);
  if (index < 0) return `along (${direction.map((c) => c.toFixed(3)).join(', ')})`;
  const sign = direction[index] > 0 ? '+' : '−';
  const [axis, rest] = AXIS_NAMES[index].split(' ');
  return `along ${sign}${axis} ${rest}`;
}
