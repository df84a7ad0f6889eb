import { useEffect, useLayoutEffect, useMemo } from 'react';
import { useThree } from '@react-three/fiber';
import * as THREE from 'three';
import type { Panel } from '@/domain/design/schema';
import { panelBasis } from './sceneLayout';
import { useScene } from './sceneContext';
import { useSelectOnClick } from './useSelectOnClick';

interface CutoutPanelProps {
  /** The panel to draw, with at least one round cut-out (required). */
  panel: Panel;
}

/** A sheet with round cut-outs: its rectangle with holes, extruded to its thickness; one mesh. */
export function CutoutPanel({ panel }: CutoutPanelProps) {
  const { resources, pickables } = useScene();
  const invalidate = useThree((s) => s.invalidate);
  const geometryKey = `cutout:${panel.id}:${panel.rect.width}:${panel.rect.height}:${panel.thickness}:${JSON.stringify(panel.cutouts)}`;
  const geometry = useMemo(() => resources.ownedGeometry(geometryKey, () => cutoutGeometry(panel)), [resources, geometryKey]); // eslint-disable-line react-hooks/exhaustive-deps
  useEffect(() => () => resources.releaseGeometry(geometryKey), [resources, geometryKey]);

  const mesh = useMemo(() => new THREE.Mesh(), []);
  useLayoutEffect(() => {
    mesh.geometry = geometry;
    mesh.material = resources.panelSurface(panel.materialId);
    mesh.matrixAutoUpdate = false;
    panelBasis(panel, mesh.matrix);
    mesh.userData.partId = panel.id;
    invalidate();
  }, [mesh, geometry, panel, resources, invalidate]);

  useEffect(() => {
    pickables.add(mesh);
    return () => {
      pickables.delete(mesh);
    };
  }, [mesh, pickables]);

  const onClick = useSelectOnClick(true);
  return <primitive object={mesh} onClick={onClick} />;
}

function cutoutGeometry(panel: Panel): THREE.BufferGeometry {
  const hw = panel.rect.width / 2;
  const hh = panel.rect.height / 2;
  const shape = new THREE.Shape([new THREE.Vector2(-hw, -hh), new THREE.Vector2(hw, -hh), new THREE.Vector2(hw, hh), new THREE.Vector2(-hw, hh)]);
  for (const cut of panel.cutouts) {
    const hole = new THREE.Path();
    hole.absarc(cut.u, cut.v, cut.diameter / 2, 0, Math.PI * 2, true);
    shape.holes.push(hole);
  }
  const geometry = new THREE.ExtrudeGeometry(shape, { depth: panel.thickness, bevelEnabled: false, curveSegments: 24 });
  geometry.translate(0, 0, -panel.thickness / 2);
  geometry.computeBoundingBox();
  geometry.computeBoundingSphere();
  return geometry;
}
