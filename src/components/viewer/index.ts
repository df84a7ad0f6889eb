/**
 * The shared viewer layer: scene components that draw a design from props (no store). Features
 * (editor, viewer page, workbench, review, link pages) compose `DesignViewer` and add their own
 * tools as children. See DEVELOPERS.md, "The viewer layer".
 */
export { DesignViewer, type DesignViewerProps } from './DesignViewer';
export type { CameraRequest, PartClickMode, PartHighlight, ViewerDisplayOptions, ViewName } from './viewerTypes';
export { VIEW_DIRECTIONS, boundingSphereOf, boundingBoxOf, fitDistance, fitBoxDistance } from './cameraFraming';
export { useScene, partIdOfHit, type SceneShared } from './sceneContext';
export { CLICK_SLOP_PX, useSelectOnClick } from './useSelectOnClick';
export { buildSceneLayout, profileMatrix, panelMatrix, type PartAnchor, type SceneLayout } from './sceneLayout';
export { SceneResources } from './sceneResources';
export { gridStepsFor } from './gridSteps';
export { designFootprint, type Footprint } from './footprint';
export type { SlotwiseSceneHook } from './SceneTestHook';
