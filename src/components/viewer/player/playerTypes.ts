/**
 * What the exploded-view player shows. Steps are the assembly core's `SequenceStep`s
 * (`src/domain/assembly/`, e.g. `sequenceOf(design).steps`): their per-part motions (insertion
 * direction and explode offset, mm) and build orientation drive the animation. Lengths in mm.
 */
import type { SequenceStep } from '@/domain/assembly';

/** What the player shows now; the scene animates toward it. */
export interface PlayerView {
  /** The design's assembly sequence, in order (from the assembly core). */
  steps: readonly SequenceStep[];
  /** Index of the current step (its parts travel in), 0-based. */
  stepIndex: number;
  /** Later steps ghosted (true) or hidden (false). */
  ghostLater: boolean;
  /** Global explode, 0 (assembled) to 1 (every placed part at its full offset). */
  explode: number;
  /** Bumps to replay the current step's travel from the start. */
  replayNonce: number;
}
