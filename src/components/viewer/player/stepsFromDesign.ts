/**
 * Player steps from a design's saved assembly steps (design.steps), with default motions:
 * profiles slide along their axis, vertical parts and panels drop in from above. Every part appears
 * in exactly one step: parts no step names are gathered in a closing step. Pure; lengths in mm.
 */
import type { DesignDocument } from '@/domain/design/schema';
import type { Vec3 } from '@/domain/geometry';
import type { PartMotion, PlayerStep } from './playerTypes';

/** Explode distance for a part, mm: a share of the design's size, at least 120 mm. */
function offsetFor(designSize: number, partSize: number): number {
  return Math.max(120, Math.min(designSize * 0.35, partSize * 0.6 + 150));
}

export function stepsFromDesign(design: DesignDocument): PlayerStep[] {
  const size = designSize(design);
  const motions = new Map<string, Omit<PartMotion, 'partId'>>();
  const down: Vec3 = [0, -1, 0];
  for (const p of design.profiles) {
    const vertical = Math.abs(p.direction[1]) > 0.7;
    // Horizontal profiles slide along their axis onto their connectors; uprights drop onto the base.
    motions.set(p.id, { insertion: vertical ? down : ([-p.direction[0], -p.direction[1], -p.direction[2]] as Vec3), offset: offsetFor(size, p.length) });
  }
  for (const panel of design.panels) {
    motions.set(panel.id, { insertion: down, offset: offsetFor(size, Math.max(panel.rect.width, panel.rect.height)) });
  }
  for (const j of design.joints) motions.set(j.id, { insertion: down, offset: offsetFor(size, 0) * 0.6 });
  for (const a of design.accessories) motions.set(a.id, { insertion: [0, 1, 0], offset: offsetFor(size, 0) * 0.6 });

  const seen = new Set<string>();
  const steps: PlayerStep[] = [];
  const orientationOf = new Map(design.subAssemblies.map((sub) => [sub.id, ORIENTATIONS[sub.buildOrientation]]));
  let current: PlayerStep['orientation'];
  for (const step of design.steps) {
    const orientation = step.subAssemblyId ? orientationOf.get(step.subAssemblyId) : undefined;
    if (!sameOrientation(orientation, current)) {
      // The piece turns over before this step is built in its new orientation: a flip step.
      steps.push({ id: `flip-before-${step.id}`, title: orientation ? 'Turn the piece over to build the next part' : 'Turn the piece upright', parts: [], flip: true, orientation });
      current = orientation;
    }
    const parts: PartMotion[] = [];
    for (const id of step.partIds) {
      const motion = motions.get(id);
      if (!motion || seen.has(id)) continue;
      seen.add(id);
      const insertion = step.insertionDirection ? ([...step.insertionDirection] as Vec3) : motion.insertion;
      parts.push({ partId: id, insertion, offset: motion.offset });
    }
    steps.push({ id: step.id, title: step.title, parts, notes: step.notes, orientation });
  }
  const rest = [...motions.entries()].filter(([id]) => !seen.has(id));
  if (rest.length > 0 && current) steps.push({ id: 'flip-upright', title: 'Turn the piece upright', parts: [], flip: true });
  if (rest.length > 0) {
    steps.push({
      id: 'remaining-parts',
      title: steps.length === 0 ? 'Put the frame together' : 'Fit the remaining parts',
      parts: rest.map(([partId, m]) => ({ partId, ...m })),
    });
  }
  return steps;
}

function designSize(design: DesignDocument): number {
  let size = 0;
  for (const p of design.profiles) size = Math.max(size, p.length);
  for (const panel of design.panels) size = Math.max(size, panel.rect.width, panel.rect.height);
  return size || 600;
}

/** Build orientations as turns of the whole piece (Y up, front -Z). */
const ORIENTATIONS: Record<'as-placed' | 'lying-on-back' | 'upside-down' | 'on-side', PlayerStep['orientation']> = {
  'as-placed': undefined,
  // Back (+Z) down: a quarter turn about X.
  'lying-on-back': { axis: [1, 0, 0], angleDeg: 90 },
  'upside-down': { axis: [1, 0, 0], angleDeg: 180 },
  'on-side': { axis: [0, 0, 1], angleDeg: 90 },
};

function sameOrientation(a: PlayerStep['orientation'], b: PlayerStep['orientation']): boolean {
  if (!a || !b) return !a && !b;
  return a.angleDeg === b.angleDeg && a.axis.every((v, i) => v === b.axis[i]);
}
