/** The exploded-view player every viewer uses: state hook, in-canvas animation, controls, step list, keys. */
export type { PlayerView } from './playerTypes';
export { framedPartIds, useStepPlayer, type StepPlayerState } from './useStepPlayer';
export { StepPictures, type StepPicture } from './StepPictures';
export { StepPlayerScene } from './StepPlayerScene';
export { StepPlayerControls } from './StepPlayerControls';
export { StepList } from './StepList';
export { usePlayerKeys } from './usePlayerKeys';
export { createGhostMaterial, StepAnimator, TRAVEL_MS, FLIP_MS } from './StepAnimator';
