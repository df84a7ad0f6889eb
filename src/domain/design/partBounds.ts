import type { Axis, DesignDocument, Vec3 } from './schema';

export interface Bounds {
  min: Vec3;
  max: Vec3;
}

/** Axis-aligned bounds of the profiles' centre lines and panels' rectangles among `ids` (whole design when ids is 'all'); null when empty. */
export function partBounds(design: DesignDocument, ids: string[] | 'all'): Bounds | null {
  const wanted = ids === 'all' ? null : new Set(ids);
  const min: Vec3 = [Infinity, Infinity, Infinity];
  const max: Vec3 = [-Infinity, -Infinity, -Infinity];
  const include = (point: readonly number[]) => {
    for (let i = 0; i < 3; i++) {
      min[i] = Math.min(min[i], point[i]);
      max[i] = Math.max(max[i], point[i]);
    }
  };
  for (const profile of design.profiles) {
    if (wanted && !wanted.has(profile.id)) continue;
    include(profile.start);
    include(profile.start.map((value, i) => value + profile.direction[i] * profile.length));
  }
  for (const panel of design.panels) {
    if (wanted && !wanted.has(panel.id)) continue;
    const axes = (['x', 'y', 'z'] as Axis[]).filter((axis) => axis !== panel.rect.normal);
    const half: number[] = [0, 0, 0];
    half[axisIndex(axes[0])] = panel.rect.width / 2;
    half[axisIndex(axes[1])] = panel.rect.height / 2;
    include(panel.rect.center.map((value, i) => value - half[i]));
    include(panel.rect.center.map((value, i) => value + half[i]));
  }
  if (!Number.isFinite(min[0])) return null;
  return { min, max };
}

export function axisIndex(axis: Axis): 0 | 1 | 2 {
  return axis === 'x' ? 0 : axis === 'y' ? 1 : 2;
}

export function boundsCentre(bounds: Bounds): Vec3 {
  return [0, 1, 2].map((i) => round((bounds.min[i] + bounds.max[i]) / 2)) as Vec3;
}

/** Where to put a duplicate: beside the originals along their thinnest direction, with a 100 mm gap. */
export function duplicateOffset(bounds: Bounds | null): Vec3 {
  if (!bounds) return [100, 0, 0];
  const extents = [0, 1, 2].map((i) => bounds.max[i] - bounds.min[i]);
  // Prefer depth (Z), then width (X); never stack upward by default.
  const order = [2, 0, 1].sort((a, b) => extents[a] - extents[b]);
  const axis = order[0];
  const offset: Vec3 = [0, 0, 0];
  offset[axis] = round(extents[axis] + 100);
  return offset;
}

function round(value: number): number {
  return Math.round(value * 1000) / 1000;
}
