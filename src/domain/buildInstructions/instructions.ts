/**
 * Build instructions: the assembly core's sequence of the design (`sequenceOf`: the designer's
 * saved order, or the generated one), each step with the parts it places by name, and the
 * hardware, hex keys and cautions the core derives, so the builder sees the same steps as the
 * designer. The workbench adds the design-wide caution to secure a tall frame on the last step.
 * Units: mm, kg.
 */
import type { DesignAnalysis } from '../analysis/types';
import { sequenceOf, type AssemblySequence, type SequenceStep, type StepHardware, type StepKind, type StepTool } from '../assembly';
import type { DesignDocument } from '../design/schema';
import { wallCaution, type Caution } from './cautions';

export type StepPartKind = 'profile' | 'panel' | 'accessory' | 'joint';

export interface StepPart {
  id: string;
  kind: StepPartKind;
  label: string;
}

export interface InstructionStep {
  /** The step id; progress is ticked against it. */
  id: string;
  /** 1-based position. */
  number: number;
  title: string;
  kind: StepKind;
  notes: string | null;
  partIds: string[];
  /** Profiles, panels and accessories placed (joints are listed through their hardware). */
  parts: StepPart[];
  /** Connectors, screws and T-nuts of the step, per catalogue part (from the core). */
  hardware: StepHardware[];
  /** Hex keys the step's screws need, by standard (from the core). */
  tools: StepTool[];
  /** The designer's caution, the core's derived cautions, and on the last step the wall caution. */
  cautions: Caution[];
  /** The core's step, for the exploded-view player (motions, orientation). */
  sequenceStep: SequenceStep;
}

function partsOf(step: SequenceStep, design: DesignDocument): StepPart[] {
  const profiles = new Map(design.profiles.map((profile) => [profile.id, profile]));
  const panels = new Map(design.panels.map((panel) => [panel.id, panel]));
  const accessories = new Map(design.accessories.map((item) => [item.id, item]));
  const parts: StepPart[] = [];
  for (const id of step.partIds) {
    const profile = profiles.get(id);
    if (profile) parts.push({ id, kind: 'profile', label: profile.label ?? id });
    const panel = panels.get(id);
    if (panel) parts.push({ id, kind: 'panel', label: panel.label ?? `${panel.role} ${id}` });
    const accessory = accessories.get(id);
    if (accessory) parts.push({ id, kind: 'accessory', label: `${accessory.kind.replace(/-/g, ' ')} ${id}` });
  }
  return parts;
}

/**
 * Every step of the design's sequence with its parts, hardware, tools and cautions. `sequence`
 * defaults to the core's `sequenceOf(design)` (built-in catalogue); pass the one already computed to share it
 * with the player.
 */
export function buildInstructions(design: DesignDocument, analysis: Pick<DesignAnalysis, 'mass'>, sequence: AssemblySequence = sequenceOf(design)): InstructionStep[] {
  const steps = sequence.steps;
  const wall = wallCaution(analysis.mass.overallSize);
  return steps.map((step, index) => {
    const cautions: Caution[] = [];
    if (step.caution) cautions.push({ kind: 'designer', text: step.caution });
    for (const caution of step.cautions) cautions.push({ kind: caution.kind, text: caution.message });
    if (index === steps.length - 1 && wall) cautions.push(wall);
    return {
      id: step.id,
      number: index + 1,
      title: step.title,
      kind: step.kind,
      notes: step.notes ?? null,
      partIds: step.partIds,
      parts: partsOf(step, design),
      hardware: step.hardware,
      tools: step.tools,
      cautions,
      sequenceStep: step,
    };
  });
}

/** The first step (id) that places each profile, for piece labels: profile id → step id. */
export function firstStepOfPiece(steps: Pick<InstructionStep, 'id' | 'partIds'>[], design: DesignDocument): Map<string, string> {
  const first = new Map<string, string>();
  const profileIds = new Set(design.profiles.map((profile) => profile.id));
  for (const step of steps) for (const id of step.partIds) if (profileIds.has(id) && !first.has(id)) first.set(id, step.id);
  // A profile no step names directly is placed with the first joint that holds it.
  const joints = new Map(design.joints.map((joint) => [joint.id, joint]));
  for (const step of steps) {
    for (const id of step.partIds) {
      for (const member of joints.get(id)?.members ?? []) if (!first.has(member.profileId)) first.set(member.profileId, step.id);
    }
  }
  return first;
}
