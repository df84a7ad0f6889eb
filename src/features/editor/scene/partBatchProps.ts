import type * as THREE from 'three';
import type { PartBatchData } from './batchCollector';

/** Props of PartBatch and of the two ways it draws (InstancedPartBatch, PerPartBatch). */
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
