import { InstancedPartBatch } from './InstancedPartBatch';
import { PerPartBatch } from './PerPartBatch';
import type { PartBatchProps } from './partBatchProps';
import { useScene } from './sceneContext';

// The props live in their own file so the batch components need not import PartBatch back.
export type { PartBatchProps } from './partBatchProps';

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

