/**
 * Workshop cautions drawn from a design: lifting, eye protection, securing tall frames. These are
 * common practice, not rules: every caution ends by deferring to local rules.
 * Units: mm, kg.
 */
import type { DesignAnalysis } from '../analysis/types';

/** kg above which a frame or piece is lifted by two people (common practice, no source; local manual-handling rules may set lower). */
export const TWO_PERSON_LIFT_KG = 25;
/** mm of height from which a free-standing frame is secured to a wall (common practice, no source). */
export const SECURE_TO_WALL_HEIGHT_MM = 1200;
/** Height over the narrowest footprint side above which a frame counts as tall (common practice, no source). */
export const SECURE_TO_WALL_SLENDERNESS = 2;

export type CautionKind = 'two-person-lift' | 'eye-protection' | 'secure-to-wall';

export interface Caution {
  kind: CautionKind;
  text: string;
}

export const LOCAL_RULES = 'Common practice; follow your local rules and the supplier’s instructions where they say more.';

/** Two people lift when `kg` (the frame or part being moved) is above TWO_PERSON_LIFT_KG. */
export function liftCaution(kg: number): Caution | null {
  if (!(kg > TWO_PERSON_LIFT_KG)) return null;
  return { kind: 'two-person-lift', text: `Two people to lift: the frame weighs about ${Math.round(kg)} kg (above ${TWO_PERSON_LIFT_KG} kg).` };
}

export function eyeProtectionCaution(): Caution {
  return { kind: 'eye-protection', text: 'Wear eye protection when cutting, drilling or tapping; aluminium chips fly.' };
}

/**
 * A frame at least SECURE_TO_WALL_HEIGHT_MM tall, or taller than SECURE_TO_WALL_SLENDERNESS times its
 * narrowest footprint side, is secured to a wall. `size` in mm with y up.
 */
export function wallCaution(size: { x: number; y: number; z: number }): Caution | null {
  const base = Math.min(size.x, size.z);
  if (size.y < SECURE_TO_WALL_HEIGHT_MM && !(base > 0 && size.y > SECURE_TO_WALL_SLENDERNESS * base)) return null;
  return { kind: 'secure-to-wall', text: `Secure this ${Math.round(size.y)} mm tall frame to a wall so it cannot tip.` };
}

/** The cautions for the whole build, for the cover of the instructions. */
export function designCautions(analysis: Pick<DesignAnalysis, 'mass' | 'cutList'>): Caution[] {
  const cautions: Caution[] = [];
  const lift = liftCaution(analysis.mass.total);
  if (lift) cautions.push(lift);
  if (analysis.cutList.length > 0) cautions.push(eyeProtectionCaution());
  const wall = wallCaution(analysis.mass.overallSize);
  if (wall) cautions.push(wall);
  return cautions;
}
