/**
 * Types of the assembly sequence: the one source for steps across the editor, the viewer, the
 * player, builds and shared links. Lengths are millimetres, masses kilograms, directions unit
 * vectors in design space (Y up, front is -Z).
 *
 * A design document stores only what a person edits (`design.steps`: order, titles, notes,
 * caution, kind, which parts go in which step). Everything else here (tools, cautions, motions,
 * masses) is derived by `sequenceOf` / `generateSequence` and never saved.
 */
import type { Vec3 } from '../geometry/vectors';
import type { BuildOrientation, StepKind } from '../design/schema';

export type { BuildOrientation, StepKind } from '../design/schema';

/** What sort of design part a step places. */
export type SequencePartRole = 'profile' | 'joint' | 'panel' | 'accessory';

/**
 * How one part travels into place: it starts at `explodeOffset` (mm, relative to its placed
 * position) and moves along `insertionDirection` until it is in place. explodeOffset is always
 * -insertionDirection x distance.
 */
export interface PartMotion {
  partId: string;
  role: SequencePartRole;
  insertionDirection: Vec3;
  explodeOffset: Vec3;
}

/**
 * T-nuts of one joint: drop-in T-nuts move normal to the slot face, slide-in T-nuts along the
 * host profile's axis from its open end. `count` is per joint (connector count x nuts each).
 */
export interface TNutMotion {
  jointId: string;
  /** The profile whose slot takes the nuts. */
  profileId: string;
  kind: 'drop-in' | 'slide-in';
  count: number;
  insertionDirection: Vec3;
  explodeOffset: Vec3;
}

/** Catalogue hardware a step uses, totalled per catalogue part. */
export interface StepHardware {
  /** Catalogue id (connector, fastener or T-nut). */
  catalogueId: string;
  category: 'connector' | 'fastener' | 't-nut';
  name: string;
  quantity: number;
}

/** A hex key a step needs, from the screw standard (ASME B18.3, ISO 4762, ISO 7380-1, ISO 10642). */
export interface StepTool {
  id: string;
  kind: 'hex-key';
  /** "3/16 in" or "6 mm". */
  label: string;
  /** Across flats, mm. */
  mm: number;
  standard: string;
  /** The screws that need it, e.g. "socket head 1/4-20". */
  screws: string[];
}

export type CautionKind = 'two-person-lift' | 'eye-protection' | 'tipping' | 'pinch';

/** A caution derived from the step's parts; `basis` says where the rule comes from. */
export interface StepCaution {
  kind: CautionKind;
  message: string;
  basis: string;
}

/** One step of a sequence, enriched for display and play-back. */
export interface SequenceStep {
  id: string;
  /** 0-based position; people read `index + 1`. */
  index: number;
  title: string;
  notes?: string;
  /** A caution written by the designer (shown beside the derived `cautions`). */
  caution?: string;
  kind: StepKind;
  subAssemblyId?: string;
  /** The orientation the piece (or sub-assembly) is in while this step is done. */
  orientation: BuildOrientation;
  /** Every design part placed in this step, in document order of the step. */
  partIds: string[];
  profileIds: string[];
  panelIds: string[];
  jointIds: string[];
  accessoryIds: string[];
  hardware: StepHardware[];
  tools: StepTool[];
  cautions: StepCaution[];
  /**
   * Mass of the parts placed in this step, kg; for flip and join steps, and steps that tip the
   * piece to fit feet or casters, the mass being moved (the sub-assembly, or the piece so far).
   */
  massKg: number;
  motions: PartMotion[];
  tNuts: TNutMotion[];
}

export interface AssemblySequence {
  /** 'saved' when it comes from design.steps, 'generated' otherwise. */
  source: 'saved' | 'generated';
  steps: SequenceStep[];
  /** Every hex key of the build, smallest first (the set to have at hand before starting). */
  tools: StepTool[];
  /** Part id -> step index. */
  stepOfPart: Map<string, number>;
  /** Part id -> motion. */
  motionOf: Map<string, PartMotion>;
}
