/**
 * What the exploded-view player plays. A minimal local shape: the assembly sequence core
 * (`src/domain/assembly/`) is the one source for steps once it lands; `stepsFromDesign` adapts
 * the design's saved steps to this shape until then. Lengths in mm.
 */
import type { Vec3 } from '@/domain/geometry';

/** How one part travels into place. */
export interface PartMotion {
  partId: string;
  /** Unit vector of travel into place (the part starts at -insertion * offset from its seat). */
  insertion: Vec3;
  /** Distance the part travels, mm (its explode offset). */
  offset: number;
}

export interface PlayerStep {
  id: string;
  title: string;
  /** Parts placed in this step (profiles, joints with their hardware, panels, accessories). */
  parts: PartMotion[];
  notes?: string;
  caution?: string;
  /**
   * Build orientation while this step is shown: the whole piece turned by `angleDeg` about `axis`
   * through its centre (a sub-assembly built upside down). A change between steps animates as a flip.
   */
  orientation?: { axis: Vec3; angleDeg: number };
  /** A step that only turns the piece over (no parts). */
  flip?: boolean;
}

/** What the player shows now; the scene animates toward it. */
export interface PlayerView {
  steps: readonly PlayerStep[];
  /** Index of the current step (its parts travel in), 0-based. */
  stepIndex: number;
  /** Later steps ghosted (true) or hidden (false). */
  ghostLater: boolean;
  /** Global explode, 0 (assembled) to 1 (every placed part at its full offset). */
  explode: number;
  /** Bumps to replay the current step's travel from the start. */
  replayNonce: number;
}
