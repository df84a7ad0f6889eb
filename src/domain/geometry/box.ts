/** Axis-aligned boxes in world space, mm. */
export interface Box {
  minX: number;
  minY: number;
  minZ: number;
  maxX: number;
  maxY: number;
  maxZ: number;
}

export function emptyBox(): Box {
  return { minX: Infinity, minY: Infinity, minZ: Infinity, maxX: -Infinity, maxY: -Infinity, maxZ: -Infinity };
}

export function isEmptyBox(b: Box): boolean {
  return !(b.maxX >= b.minX && b.maxY >= b.minY && b.maxZ >= b.minZ);
}

/** Grows `target` in place to contain `b`. */
export function expandBoxInPlace(target: Box, b: Box): void {
  if (b.minX < target.minX) target.minX = b.minX;
  if (b.minY < target.minY) target.minY = b.minY;
  if (b.minZ < target.minZ) target.minZ = b.minZ;
  if (b.maxX > target.maxX) target.maxX = b.maxX;
  if (b.maxY > target.maxY) target.maxY = b.maxY;
  if (b.maxZ > target.maxZ) target.maxZ = b.maxZ;
}

/**
 * How deep two boxes interpenetrate: the smallest overlap over the three axes, mm.
 * Negative when they are apart, 0 when faces touch.
 */
export function boxPenetration(a: Box, b: Box): number {
  const ox = Math.min(a.maxX, b.maxX) - Math.max(a.minX, b.minX);
  const oy = Math.min(a.maxY, b.maxY) - Math.max(a.minY, b.minY);
  const oz = Math.min(a.maxZ, b.maxZ) - Math.max(a.minZ, b.minZ);
  return Math.min(ox, oy, oz);
}

/** True when the boxes overlap or lie within `margin` mm of each other. */
export function boxesNear(a: Box, b: Box, margin = 0): boolean {
  return (
    a.minX <= b.maxX + margin &&
    b.minX <= a.maxX + margin &&
    a.minY <= b.maxY + margin &&
    b.minY <= a.maxY + margin &&
    a.minZ <= b.maxZ + margin &&
    b.minZ <= a.maxZ + margin
  );
}

/** Distance (mm) from point `p` to the box with these corners; 0 inside. */
export function distancePointToCorners(p: readonly [number, number, number], minX: number, minY: number, minZ: number, maxX: number, maxY: number, maxZ: number): number {
  const dx = Math.max(minX - p[0], 0, p[0] - maxX);
  const dy = Math.max(minY - p[1], 0, p[1] - maxY);
  const dz = Math.max(minZ - p[2], 0, p[2] - maxZ);
  // Inside, or off one face (the usual answers): the exact value Math.hypot gives, without its call.
  if (dx === 0 && dy === 0) return dz;
  if (dy === 0 && dz === 0) return dx;
  if (dx === 0 && dz === 0) return dy;
  return Math.hypot(dx, dy, dz);
}

export function pointInBox(b: Box, p: readonly [number, number, number], margin = 0): boolean {
  return (
    p[0] >= b.minX - margin &&
    p[0] <= b.maxX + margin &&
    p[1] >= b.minY - margin &&
    p[1] <= b.maxY + margin &&
    p[2] >= b.minZ - margin &&
    p[2] <= b.maxZ + margin
  );
}

export function boxCentre(b: Box): [number, number, number] {
  return [(b.minX + b.maxX) / 2, (b.minY + b.maxY) / 2, (b.minZ + b.maxZ) / 2];
}

export function translateBox(b: Box, t: readonly [number, number, number]): Box {
  return {
    minX: b.minX + t[0],
    minY: b.minY + t[1],
    minZ: b.minZ + t[2],
    maxX: b.maxX + t[0],
    maxY: b.maxY + t[1],
    maxZ: b.maxZ + t[2],
  };
}
