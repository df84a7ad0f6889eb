import type * as THREE from 'three';
import type { PartBatchData } from './batchCollector';
import { InstancedPartBatch } from './InstancedPartBatch';
import { PerPartBatch } from './PerPartBatch';
import { useScene } from './sceneContext';

export interface PartBatchProps {
  /** The instances to draw: matrices and the part id of each (required). */
  data: PartBatchData;
  /** Shared geometry of every instance, owned by SceneResources (required). */
  geometry: THREE.BufferGeometry;
  /** Shared material of every instance, owned by SceneResources (required). */
  material: THREE.Material;
  /** Whether clicks and hover pick these parts (default true). */
  pickable?: boolean;
}

export { CLICK_SLOP_PX } from './useSelectOnClick';

/**
 * One batch of parts sharing a geometry and a material, drawn as ONE InstancedMesh written
 * imperatively (or one mesh per part under `?renderMode=per-part`). Matrices are rewritten only
 * when the batch data changes; colours follow selection, hover and findings.
 */
export function PartBatch({ data, geometry, material, pickable = true }: PartBatchProps) {
  const { renderMode } = useScene();
  return renderMode === 'per-part' ? (
    <PerPartBatch data={data} geometry={geometry} material={material} pickable={pickable} />
  ) : (
    <InstancedPartBatch data={data} geometry={geometry} material={material} pickable={pickable} />
  );
}

