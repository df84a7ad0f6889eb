import { useLayoutEffect, useMemo } from 'react';
import { useEditorStore } from '../store/editorStore';
import type { PartBatchData } from './batchCollector';
import { CutoutPanel } from './CutoutPanel';
import { PartBatch } from './PartBatch';
import { buildSceneLayout } from './sceneLayout';
import { useScene } from './sceneContext';

/**
 * Every part of the store's design: profiles with their real cross-sections, hardware, machining
 * and sheets, batched by (geometry, material). Rebuilt only when the design object changes.
 * Takes no props.
 */
export function DesignParts() {
  const design = useEditorStore((s) => s.design);
  const { catalogue, resources, anchors } = useScene();
  const layout = useMemo(() => buildSceneLayout(design, catalogue), [design, catalogue]);

  useLayoutEffect(() => {
    anchors.current = layout.anchors;
  }, [layout, anchors]);

  return (
    <group name="design-parts">
      {layout.batches.map((batch) => {
        const geometry = batchGeometry(batch, resources);
        if (!geometry) return null;
        const material = batch.surface.kind === 'panel' ? resources.panelSurface(batch.surface.materialId) : resources.surface(batch.surface.key);
        return <PartBatch key={batch.key} data={batch} geometry={geometry} material={material} />;
      })}
      {layout.cutoutPanels.map((panel) => (
        <CutoutPanel key={panel.id} panel={panel} />
      ))}
    </group>
  );
}

function batchGeometry(batch: PartBatchData, resources: ReturnType<typeof useScene>['resources']) {
  return batch.geometry.kind === 'profile' ? resources.profileGeometry(batch.geometry.variantId) : resources.hardwareGeometry(batch.geometry.shape);
}
