/**
 * Edits of the assembly sequence, as pure functions on the design document. The editor runs them
 * as `DesignOperation`s (design/operations.ts), so each is one undoable command. Every edit first
 * takes the generated order when the design has no saved steps, and marks the order as edited;
 * `regenerateSequence` throws the edits away (the editor asks first when `sequenceEdited`).
 */
import { createIdAllocator } from '../design/ids';
import { OperationError, type StepChanges } from '../design/operationTypes';
import type { AssemblyStep, DesignDocument } from '../design/schema';
import { generateSteps } from './generateSteps';

export type { StepChanges };

function stepsOf(design: DesignDocument): AssemblyStep[] {
  return design.steps.length > 0 ? design.steps : generateSteps(design);
}

function edited(design: DesignDocument, steps: AssemblyStep[]): DesignDocument {
  return { ...design, steps, sequenceEdited: true };
}

function indexOf(steps: AssemblyStep[], stepId: string): number {
  const i = steps.findIndex((s) => s.id === stepId);
  if (i < 0) throw new OperationError(`There is no step ${stepId} in the sequence`);
  return i;
}

/** Moves a step to position `toIndex` (0-based, in the list after the move; clamped). */
export function moveStep(design: DesignDocument, stepId: string, toIndex: number): DesignDocument {
  const steps = [...stepsOf(design)];
  const from = indexOf(steps, stepId);
  const [step] = steps.splice(from, 1);
  const to = Math.max(0, Math.min(steps.length, Math.round(toIndex)));
  steps.splice(to, 0, step);
  return edited(design, steps);
}

/** Moves a step to just before another one. */
export function moveStepBefore(design: DesignDocument, stepId: string, beforeStepId: string): DesignDocument {
  const steps = stepsOf(design);
  const from = indexOf(steps, stepId);
  const target = indexOf(steps, beforeStepId);
  return moveStep({ ...design, steps }, stepId, from < target ? target - 1 : target);
}

/** Moves a step to just after another one. */
export function moveStepAfter(design: DesignDocument, stepId: string, afterStepId: string): DesignDocument {
  const steps = stepsOf(design);
  const from = indexOf(steps, stepId);
  const target = indexOf(steps, afterStepId);
  return moveStep({ ...design, steps }, stepId, from < target ? target : target + 1);
}

/** Merges steps into the first of them (in sequence order); its title, notes and kind stay. */
export function mergeSteps(design: DesignDocument, stepIds: string[]): DesignDocument {
  const steps = stepsOf(design);
  const wanted = new Set(stepIds);
  const merged = steps.filter((s) => wanted.has(s.id));
  if (merged.length !== wanted.size) throw new OperationError(`Some of ${stepIds.join(', ')} are not in the sequence`);
  if (merged.length < 2) throw new OperationError('Choose at least two steps to merge');
  const [first, ...rest] = merged;
  const partIds = [...first.partIds];
  for (const s of rest) for (const id of s.partIds) if (!partIds.includes(id)) partIds.push(id);
  const notes = merged.map((s) => s.notes).filter(Boolean).join('\n');
  const caution = merged.map((s) => s.caution).filter(Boolean).join('\n');
  const into: AssemblyStep = { ...first, partIds, ...(notes ? { notes } : {}), ...(caution ? { caution } : {}) };
  return edited(
    design,
    steps.filter((s) => s === first || !wanted.has(s.id)).map((s) => (s === first ? into : s)),
  );
}

/** Splits `partIds` out of a step into a new step right after it; returns the design (new step id is `newStepId` or fresh). */
export function splitStep(design: DesignDocument, stepId: string, partIds: string[], newStepId?: string): DesignDocument {
  const steps = [...stepsOf(design)];
  const i = indexOf(steps, stepId);
  const step = steps[i];
  const moving = new Set(partIds.filter((id) => step.partIds.includes(id)));
  if (moving.size === 0) throw new OperationError(`None of ${partIds.join(', ')} are in step ${i + 1}`);
  if (moving.size === step.partIds.length) throw new OperationError('Leave at least one part in the step being split');
  const id = newStepId ?? createIdAllocator({ ...design, steps }).next('step');
  const second: AssemblyStep = { id, title: `${step.title} (continued)`, partIds: step.partIds.filter((p) => moving.has(p)), kind: step.kind, ...(step.subAssemblyId ? { subAssemblyId: step.subAssemblyId } : {}), ...(step.orientation ? { orientation: step.orientation } : {}) };
  steps.splice(i, 1, { ...step, partIds: step.partIds.filter((p) => !moving.has(p)) }, second);
  return edited(design, steps);
}

/** Moves parts (from whatever steps hold them) into a step, at its end. */
export function movePartsToStep(design: DesignDocument, partIds: string[], stepId: string): DesignDocument {
  const steps = stepsOf(design);
  indexOf(steps, stepId);
  const moving = new Set(partIds);
  return edited(
    design,
    steps.map((s) => {
      const kept = s.partIds.filter((p) => !moving.has(p));
      return s.id === stepId ? { ...s, partIds: [...kept, ...partIds] } : kept.length === s.partIds.length ? s : { ...s, partIds: kept };
    }),
  );
}

/** Sets a step's title, notes, caution or kind. */
export function updateStep(design: DesignDocument, stepId: string, changes: StepChanges): DesignDocument {
  const steps = stepsOf(design);
  indexOf(steps, stepId);
  if (changes.title !== undefined && changes.title.trim() === '') throw new OperationError('A step needs a title');
  return edited(
    design,
    steps.map((s) => {
      if (s.id !== stepId) return s;
      const next: AssemblyStep = { ...s };
      if (changes.title !== undefined) next.title = changes.title.trim().slice(0, 120);
      if (changes.kind !== undefined) next.kind = changes.kind;
      for (const key of ['notes', 'caution'] as const) {
        const value = changes[key];
        if (value === undefined) continue;
        if (value.trim() === '') delete next[key];
        else next[key] = value.slice(0, key === 'notes' ? 2000 : 500);
      }
      return next;
    }),
  );
}

/** Replaces the steps with the generated order and clears `sequenceEdited`. */
export function regenerateSequence(design: DesignDocument): DesignDocument {
  return { ...design, steps: generateSteps({ ...design, steps: [] }), sequenceEdited: false };
}

/**
 * After a change to the parts: an order the designer never edited follows the design (it is
 * generated again); an edited one is kept (removed parts already leave their steps; new parts
 * wait for the designer, and the check lists them).
 */
export function followPartChanges(before: DesignDocument, after: DesignDocument): DesignDocument {
  if (after === before || after.sequenceEdited || after.steps.length === 0) return after;
  return { ...after, steps: generateSteps(after) };
}
