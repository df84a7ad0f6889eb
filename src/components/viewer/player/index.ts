/** The exploded-view player every viewer uses: state hook, in-canvas animation, controls, step list, keys. */
export type { PartMotion, PlayerStep, PlayerView } from './playerTypes';
export { stepsFromDesign } from './stepsFromDesign';
export { useStepPlayer, type StepPlayerState } from './useStepPlayer';
export { StepPlayerScene } from './StepPlayerScene';
export { StepPlayerControls } from './StepPlayerControls';
export { StepList } from './StepList';
export { usePlayerKeys } from './usePlayerKeys';
export { StepAnimator, TRAVEL_MS, FLIP_MS } from './StepAnimator';
