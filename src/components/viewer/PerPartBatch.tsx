import { useEffect, useLayoutEffect, useMemo } from 'react';
import { useThree } from '@react-three/fiber';
import * as THREE from 'three';
import type { PartBatchProps } from './PartBatch';
import { useScene } from './sceneContext';
import { useSelectOnClick } from './useSelectOnClick';

// Props as PartBatch's: data, geometry, material (required), pickable (default true).

/** Baseline for the benchmark: a plain mesh per part, sharing geometry and material. */
export function PerPartBatch({ data, geometry, material, pickable }: Required<PartBatchProps>) {
  const invalidate = useThree((s) => s.invalidate);
  const { pickables } = useScene();
  const group = useMemo(() => new THREE.Group(), []);

  useLayoutEffect(() => {
    group.name = `batch:${data.key}`;
    group.clear();
    const matrix = new THREE.Matrix4();
    data.partIds.forEach((partId, i) => {
      const mesh = new THREE.Mesh(geometry, material);
      matrix.fromArray(data.matrices, i * 16);
      mesh.matrixAutoUpdate = false;
      mesh.matrix.copy(matrix);
      mesh.userData.partId = partId;
      group.add(mesh);
    });
    invalidate();
  }, [group, data, geometry, material, invalidate]);

  useEffect(() => {
    if (!pickable) return;
    pickables.add(group);
    return () => {
      pickables.delete(group);
    };
  }, [group, pickable, pickables]);

  const onClick = useSelectOnClick(pickable);
  return <primitive object={group} onClick={onClick} />;
}

