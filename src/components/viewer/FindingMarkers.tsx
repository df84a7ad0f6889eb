import { useEffect, useLayoutEffect, useMemo } from 'react';
import { useThree } from '@react-three/fiber';
import * as THREE from 'three';
import type { DesignAnalysis } from '@/domain/analysis/types';
import type { DesignDocument } from '@/domain/design/schema';
import { SEVERITY_COLOR, worstSeverityByPart } from './partHighlight';
import { useScene } from './sceneContext';

interface FindingMarkersProps {
  /** The design drawn (required; badges move when it changes). */
  design: DesignDocument;
  /** Its analysis, or null while none is ready (required). */
  analysis: DesignAnalysis | null;
  /** Badge size as a share of the design's overall size (default 0.012), clamped to 8–60 mm. */
  relativeSize?: number;
}

/**
 * A small severity-coloured badge above every part an error or warning names (the worst wins),
 * drawn through the frame so it is never hidden; the part itself is tinted by PartBatch.
 * One instanced mesh in all.
 */
export function FindingMarkers({ design, analysis, relativeSize = 0.012 }: FindingMarkersProps) {
  const { resources, anchors } = useScene();
  const invalidate = useThree((s) => s.invalidate);
  const geometry = resources.hardwareGeometry('badge');
  const material = resources.surface('badge');

  // Notes (corner notches, tip-over figures) stay in the list only: a badge on every notched panel is noise.
  const marks = useMemo(
    () => [...worstSeverityByPart(analysis).entries()].filter(([, severity]) => severity !== 'note'),
    [analysis],
  );
  const capacity = Math.max(16, 2 ** Math.ceil(Math.log2(marks.length + 1)));
  const mesh = useMemo(() => {
    const m = new THREE.InstancedMesh(geometry, material, capacity);
    m.renderOrder = 10;
    m.name = 'finding-markers';
    return m;
  }, [geometry, material, capacity]);
  useEffect(() => () => mesh.dispose(), [mesh]);

  useLayoutEffect(() => {
    const all = [...anchors.current.values()];
    let extent = 0;
    for (const a of all) extent = Math.max(extent, Math.abs(a.center[0]) + a.radius, Math.abs(a.center[1]) + a.radius, Math.abs(a.center[2]) + a.radius);
    const size = THREE.MathUtils.clamp(extent * 2 * relativeSize, 8, 60);
    const m = new THREE.Matrix4();
    let n = 0;
    for (const [partId, severity] of marks) {
      const anchor = anchors.current.get(partId);
      if (!anchor) continue;
      // Above the part's centre, clear of a profile's section.
      m.makeScale(size, size * 1.3, size).setPosition(anchor.center[0], anchor.center[1] + Math.min(anchor.radius, 40) + size, anchor.center[2]);
      mesh.setMatrixAt(n, m);
      mesh.setColorAt(n, SEVERITY_COLOR[severity]);
      n++;
    }
    mesh.count = n;
    mesh.instanceMatrix.needsUpdate = true;
    if (mesh.instanceColor) mesh.instanceColor.needsUpdate = true;
    mesh.computeBoundingSphere();
    mesh.visible = n > 0;
    invalidate();
  }, [mesh, marks, design, anchors, relativeSize, invalidate]);

  return <primitive object={mesh} raycast={() => null} />;
}
