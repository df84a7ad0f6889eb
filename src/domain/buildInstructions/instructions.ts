/**
 * Build instructions: for each assembly step, the parts it places, the hardware and tools it needs
 * and its cautions. Steps come from the design document (`design.steps`); a design without steps
 * gets one step per profile, then its panels, then its accessories.
 * Units: mm, kg.
 */
import type { DesignAnalysis, ToolItem } from '../analysis/types';
import { createAnalysisContext } from '../analysis/analyze';
import { hardwareSummary } from '../outputs/hardware';
import type { DesignDocument } from '../design/schema';
import { liftCaution, wallCaution, type Caution } from './cautions';

export type StepPartKind = 'profile' | 'panel' | 'accessory' | 'joint';

export interface StepPart {
  id: string;
  kind: StepPartKind;
  label: string;
}

export interface StepHardware {
  code: string;
  description: string;
  category: string;
  quantity: number;
  unit: 'pcs' | 'm';
}

export interface InstructionStep {
  /** The step id; progress is ticked against it. */
  id: string;
  /** 1-based position. */
  number: number;
  title: string;
  notes: string | null;
  partIds: string[];
  /** Profiles, panels and accessories placed (joints are listed through their hardware). */
  parts: StepPart[];
  hardware: StepHardware[];
  tools: ToolItem[];
  cautions: Caution[];
  /** Unit vector the parts go in along, when the step says. */
  insertionDirection: [number, number, number] | null;
}

interface RawStep {
  id: string;
  title: string;
  notes?: string;
  partIds: string[];
  insertionDirection?: [number, number, number];
}

function fallbackSteps(design: DesignDocument): RawStep[] {
  const steps: RawStep[] = design.profiles.map((profile, index) => {
    const joints = design.joints.filter((joint) => joint.members[0]?.profileId === profile.id).map((joint) => joint.id);
    return { id: `auto-${index + 1}`, title: `Fit ${profile.label ?? profile.id}`, partIds: [profile.id, ...joints] };
  });
  if (design.panels.length > 0) steps.push({ id: 'auto-panels', title: 'Fit the panels', partIds: design.panels.map((panel) => panel.id) });
  if (design.accessories.length > 0) steps.push({ id: 'auto-accessories', title: 'Fit the accessories', partIds: design.accessories.map((item) => item.id) });
  return steps;
}

/** The steps in order, from the document or made up per profile when it has none. */
export function rawSteps(design: DesignDocument): RawStep[] {
  if (design.steps.length > 0) {
    return design.steps.map((step) => ({ id: step.id, title: step.title, notes: step.notes, partIds: step.partIds, insertionDirection: step.insertionDirection as RawStep['insertionDirection'] }));
  }
  return fallbackSteps(design);
}

/** Rough mass (kg) of the parts placed so far, from the analysis BOM shares. */
function massOfParts(analysis: DesignAnalysis, placed: Set<string>): number {
  let kg = 0;
  for (const line of analysis.bom) {
    if (line.partIds.length === 0) continue;
    const share = line.partIds.filter((id) => placed.has(id)).length / line.partIds.length;
    kg += line.lineMass * share;
  }
  return kg;
}

/** Every step with its parts, hardware, tools and cautions. */
export function buildInstructions(design: DesignDocument, analysis: DesignAnalysis): InstructionStep[] {
  const profiles = new Map(design.profiles.map((profile) => [profile.id, profile]));
  const panels = new Map(design.panels.map((panel) => [panel.id, panel]));
  const accessories = new Map(design.accessories.map((item) => [item.id, item]));
  const placed = new Set<string>();
  let liftShown = false;
  const steps = rawSteps(design);

  return steps.map((step, index) => {
    const parts: StepPart[] = [];
    for (const id of step.partIds) {
      const profile = profiles.get(id);
      if (profile) parts.push({ id, kind: 'profile', label: profile.label ?? id });
      const panel = panels.get(id);
      if (panel) parts.push({ id, kind: 'panel', label: panel.label ?? `${panel.role} ${id}` });
      const accessory = accessories.get(id);
      if (accessory) parts.push({ id, kind: 'accessory', label: `${accessory.kind.replace(/-/g, ' ')} ${id}` });
    }
    // Exact hardware of the step: the hardware summary of the design cut down to this step's joints and accessories.
    const stepJoints = design.joints.filter((joint) => step.partIds.includes(joint.id));
    const stepAccessories = design.accessories.filter((item) => step.partIds.includes(item.id));
    const hardware: StepHardware[] =
      stepJoints.length + stepAccessories.length === 0
        ? []
        : hardwareSummary(createAnalysisContext({ ...design, joints: stepJoints, accessories: stepAccessories, panels: [] })).lines.map((line) => ({
            code: line.partCode,
            description: line.description,
            category: line.category,
            quantity: Math.round(line.quantity * 1000) / 1000,
            unit: line.unit,
          }));
    const fastenerText = hardware.map((line) => line.description).join(' ');
    const tools = analysis.tools.filter((tool) => {
      if (tool.kind === 'hex-key') return stepJoints.length > 0 || /screw|bolt/i.test(fastenerText) || tool.reason.split(/\s+/).some((word) => word.length > 3 && fastenerText.includes(word));
      if (tool.kind === 'square') return stepJoints.length > 0;
      if (tool.kind === 'mallet') return step.partIds.some((id) => panels.has(id) || accessories.get(id)?.kind === 'end-cap');
      return false;
    });

    for (const id of step.partIds) placed.add(id);
    for (const joint of stepJoints) for (const member of joint.members) placed.add(member.profileId);
    const cautions: Caution[] = [];
    const massSoFar = massOfParts(analysis, placed);
    const moves = step.partIds.some((id) => accessories.get(id)?.kind === 'leveling-foot' || accessories.get(id)?.kind === 'caster') || /tip|lift|turn|stand/i.test(`${step.title} ${step.notes ?? ''}`);
    const lift = liftCaution(massSoFar);
    if (lift && (moves || !liftShown)) {
      cautions.push(lift);
      liftShown = true;
    }
    if (index === steps.length - 1) {
      const wall = wallCaution(analysis.mass.overallSize);
      if (wall) cautions.push(wall);
    }
    return {
      id: step.id,
      number: index + 1,
      title: step.title,
      notes: step.notes ?? null,
      partIds: step.partIds,
      parts,
      hardware,
      tools,
      cautions,
      insertionDirection: step.insertionDirection ?? null,
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
