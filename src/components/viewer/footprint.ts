/** The plan footprint of a design (pure, mm): the x/z extent of its profiles and panels. */
import type { DesignDocument } from '@/domain/design/schema';

export interface Footprint {
  minX: number;
  maxX: number;
  minZ: number;
  maxZ: number;
}

/** The x/z box around every profile end and panel centre, mm; a 600 mm square at the origin when empty. */
export function designFootprint(design: DesignDocument): Footprint {
  let minX = Infinity;
  let maxX = -Infinity;
  let minZ = Infinity;
  let maxZ = -Infinity;
  const take = (x: number, z: number) => {
    minX = Math.min(minX, x);
    maxX = Math.max(maxX, x);
    minZ = Math.min(minZ, z);
    maxZ = Math.max(maxZ, z);
  };
  for (const p of design.profiles) {
    take(p.start[0], p.start[2]);
    take(p.start[0] + p.direction[0] * p.length, p.start[2] + p.direction[2] * p.length);
  }
  for (const panel of design.panels) take(panel.rect.center[0], panel.rect.center[2]);
  if (!Number.isFinite(minX)) return { minX: -300, maxX: 300, minZ: -300, maxZ: 300 };
  return { minX, maxX, minZ, maxZ };
}
