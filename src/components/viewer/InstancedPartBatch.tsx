import { useEffect, useLayoutEffect, useMemo } from 'react';
import { useThree } from '@react-three/fiber';
import * as THREE from 'three';
import type { PartBatchProps } from './PartBatch';
import { colourFor, worstSeverityByPart } from './partHighlight';
import { useHighlight, useScene } from './sceneContext';
import type { PartHighlight } from './viewerTypes';
import { useSelectOnClick } from './useSelectOnClick';

// Props as PartBatch's: data, geometry, material (required), pickable (default true).

function capacityFor(count: number): number {
  // Room to grow, so adding a profile rewrites matrices instead of building a new mesh.
  return Math.max(16, 2 ** Math.ceil(Math.log2(Math.max(1, count) * 1.25)));
}

/** The normal path: ONE InstancedMesh for the batch, matrices and colours written imperatively. */
export function InstancedPartBatch({ data, geometry, material, pickable }: Required<PartBatchProps>) {
  const highlight = useHighlight();
  const invalidate = useThree((s) => s.invalidate);
  const { pickables } = useScene();
  const count = data.partIds.length;
  const capacity = capacityFor(count);

  const mesh = useMemo(() => {
    const instanced = new THREE.InstancedMesh(geometry, material, capacity);
    instanced.name = `batch:${data.key}`;
    instanced.frustumCulled = true;
    return instanced;
    // A new mesh only when the shared resources or the capacity change.
    // eslint-disable-next-line react-hooks/exhaustive-deps
  }, [geometry, material, capacity]);

  useEffect(() => () => mesh.dispose(), [mesh]);

  useLayoutEffect(() => {
    (mesh.instanceMatrix.array as Float32Array).set(data.matrices);
    mesh.count = count;
    mesh.instanceMatrix.needsUpdate = true;
    mesh.userData.partIds = data.partIds;
    mesh.computeBoundingSphere();
    mesh.computeBoundingBox();
    invalidate();
  }, [mesh, data, count, invalidate]);

  useLayoutEffect(() => {
    // Colours follow selection, hover and findings: written into the instance colours, no re-layout.
    writeColours(mesh, data.partIds, highlight);
    invalidate();
  }, [mesh, data, highlight, invalidate]);

  useEffect(() => {
    if (!pickable) return;
    pickables.add(mesh);
    return () => {
      pickables.delete(mesh);
    };
  }, [mesh, pickable, pickables]);

  const onClick = useSelectOnClick(pickable);
  return <primitive object={mesh} onClick={onClick} />;
}

const severityCache = new WeakMap<object, ReturnType<typeof worstSeverityByPart>>();

function writeColours(mesh: THREE.InstancedMesh, partIds: string[], state: PartHighlight): void {
  let severity = state.analysis ? severityCache.get(state.analysis) : undefined;
  if (!severity) {
    severity = worstSeverityByPart(state.analysis);
    if (state.analysis) severityCache.set(state.analysis, severity);
  }
  const selected = new Set(state.selection);
  for (let i = 0; i < partIds.length; i++) mesh.setColorAt(i, colourFor(partIds[i], selected, state.hoveredId, severity));
  if (mesh.instanceColor) mesh.instanceColor.needsUpdate = true;
}

