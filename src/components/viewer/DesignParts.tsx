import { useLayoutEffect, useMemo } from 'react';
import type { DesignDocument } from '@/domain/design/schema';
import type { PartBatchData } from './batchCollector';
import { CutoutPanel } from './CutoutPanel';
import { PartBatch } from './PartBatch';
import { buildSceneLayout } from './sceneLayout';
import { useScene } from './sceneContext';

interface DesignPartsProps {
  /** The design to draw (required). */
  design: DesignDocument;
  /** Draw the panels (default true); false hides every sheet to see inside. */
  panels?: boolean;
}

/**
 * Every part of a design: profiles with their real cross-sections, hardware, machining and
 * sheets, batched by (geometry, material). Rebuilt only when the design object changes.
 */
export function DesignParts({ design, panels = true }: DesignPartsProps) {
  const { catalogue, resources, anchors } = useScene();
  const layout = useMemo(() => buildSceneLayout(design, catalogue), [design, catalogue]);

  useLayoutEffect(() => {
    anchors.current = layout.anchors;
  }, [layout, anchors]);

  return (
    <group name="design-parts">
      {layout.batches.map((batch) => {
        if (!panels && batch.role === 'panel') return null;
        const geometry = batchGeometry(batch, resources);
        if (!geometry) return null;
        const material = batch.surface.kind === 'panel' ? resources.panelSurface(batch.surface.materialId) : resources.surface(batch.surface.key);
        return <PartBatch key={batch.key} data={batch} geometry={geometry} material={material} />;
      })}
      {(panels ? layout.cutoutPanels : []).map((panel) => (
        <CutoutPanel key={panel.id} panel={panel} />
      ))}
    </group>
  );
}

function batchGeometry(batch: PartBatchData, resources: ReturnType<typeof useScene>['resources']) {
  return batch.geometry.kind === 'profile' ? resources.profileGeometry(batch.geometry.variantId) : resources.hardwareGeometry(batch.geometry.shape);
}
