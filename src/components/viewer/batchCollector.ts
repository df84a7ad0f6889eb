/**
 * Collects part placements into batches: one batch per (geometry, material), later drawn as one
 * InstancedMesh. Pure data plus three.js maths, so layouts are testable in Node.
 */
import * as THREE from 'three';
import type { HardwareShape } from './hardwareGeometry';
import type { SurfaceKey } from './sceneResources';

export type BatchGeometry = { kind: 'profile'; variantId: string } | { kind: 'hardware'; shape: HardwareShape };
export type BatchSurface = { kind: 'surface'; key: SurfaceKey } | { kind: 'panel'; materialId: string };

/** What a batch stands for, so hover, selection and tests can tell batches apart. */
export type BatchRole = 'profile' | 'connector' | 'fastener' | 'accessory' | 'machining' | 'panel';

export interface PartBatchData {
  key: string;
  role: BatchRole;
  geometry: BatchGeometry;
  surface: BatchSurface;
  /** The design part each instance belongs to (the id selection and hover use). */
  partIds: string[];
  /** 16 floats per instance, column-major (THREE.Matrix4.elements order). */
  matrices: Float32Array;
}

export class BatchCollector {
  private readonly batches = new Map<string, { role: BatchRole; geometry: BatchGeometry; surface: BatchSurface; partIds: string[]; matrices: number[] }>();

  add(role: BatchRole, geometry: BatchGeometry, surface: BatchSurface, partId: string, matrix: THREE.Matrix4): void {
    const key = `${role}|${geometryKey(geometry)}|${surfaceKey(surface)}`;
    let batch = this.batches.get(key);
    if (!batch) {
      batch = { role, geometry, surface, partIds: [], matrices: [] };
      this.batches.set(key, batch);
    }
    batch.partIds.push(partId);
    for (let i = 0; i < 16; i++) batch.matrices.push(matrix.elements[i]);
  }

  result(): PartBatchData[] {
    return [...this.batches.entries()].map(([key, b]) => ({
      key,
      role: b.role,
      geometry: b.geometry,
      surface: b.surface,
      partIds: b.partIds,
      matrices: Float32Array.from(b.matrices),
    }));
  }
}

export function geometryKey(g: BatchGeometry): string {
  return g.kind === 'profile' ? `profile:${g.variantId}` : `hardware:${g.shape}`;
}

export function surfaceKey(s: BatchSurface): string {
  return s.kind === 'surface' ? s.key : `panel:${s.materialId}`;
}

/** Matrix with the given basis columns (already scaled) and translation. */
export function basisMatrix(
  out: THREE.Matrix4,
  x: readonly number[],
  y: readonly number[],
  z: readonly number[],
  position: readonly number[],
): THREE.Matrix4 {
  return out.set(x[0], y[0], z[0], position[0], x[1], y[1], z[1], position[1], x[2], y[2], z[2], position[2], 0, 0, 0, 1);
}
