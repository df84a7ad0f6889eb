/**
 * What the scene's components share: the catalogue, the geometry/material cache, the pickable
 * objects for hover, the latest part anchors, the render mode and the move gizmo (so a click on
 * its handles is not taken for a click on empty space). Set up once by DesignViewer.
 */
import { createContext, useContext } from 'react';
import type * as THREE from 'three';
import type { Catalogue } from '@/domain/catalogue';
import type { PartAnchor } from './sceneLayout';
import type { SceneResources } from './sceneResources';
import type { RenderMode } from './renderMode';
import type { PartClickMode, PartHighlight } from './viewerTypes';

export interface SceneShared {
  catalogue: Catalogue;
  resources: SceneResources;
  renderMode: RenderMode;
  /** Objects the hover ray tests (instanced meshes, per-part groups, cut-out panels). */
  pickables: Set<THREE.Object3D>;
  /** Centre and radius of every part of the current design, by id. */
  anchors: { current: Map<string, PartAnchor> };
  /** Turns the camera to look at the whole design from a direction (target → camera); set by CameraDirector. */
  aimCamera: { current: ((direction: THREE.Vector3) => void) | null };
  /** True while a tool handle (the editor's move gizmo) is hovered or dragged: clicks are not picks. */
  gizmoBusy: { current: boolean };
}

export const SceneContext = createContext<SceneShared | null>(null);

export function useScene(): SceneShared {
  const shared = useContext(SceneContext);
  if (!shared) throw new Error('Scene components must be inside <DesignViewer>.');
  return shared;
}

/** The part id under a ray hit on a batch (instanced or per-part). */
export function partIdOfHit(object: THREE.Object3D, instanceId: number | undefined): string | null {
  const ids = object.userData.partIds as string[] | undefined;
  if (ids && instanceId !== undefined) return ids[instanceId] ?? null;
  return (object.userData.partId as string | undefined) ?? null;
}

const NO_HIGHLIGHT: PartHighlight = { selection: [], hoveredId: null, analysis: null };

/** Selection, hover and findings for part colours; changes re-colour instances without a re-layout. */
export const HighlightContext = createContext<PartHighlight>(NO_HIGHLIGHT);

export function useHighlight(): PartHighlight {
  return useContext(HighlightContext);
}

/** The click handler for parts (undefined: parts are not clickable). */
export const PartClickContext = createContext<((partId: string, mode: PartClickMode) => void) | undefined>(undefined);
