/**
 * The slot a captured panel sits in. One rule for the panel-fit check and the editor's input
 * checks: where profiles of different systems bound a panel, the smallest opening and the smallest
 * engagement govern. mm.
 */
import { defaultCatalogue, getSystem, getVariant } from '../catalogue';
import type { Catalogue, ProfileSystem } from '../catalogue/types';
import type { DesignDocument } from './schema';

export interface SlotLimits {
  /** Narrowest slot opening around the panel, mm. */
  slotOpening: number;
  /** Shallowest slot engagement around the panel, mm. */
  engagement: number;
  /** The system with the narrowest opening (named in messages). */
  system: ProfileSystem;
}

/** The governing slot of these systems, or null when there are none. */
export function slotLimitsOf(systems: readonly ProfileSystem[]): SlotLimits | null {
  if (systems.length === 0) return null;
  let system = systems[0];
  let engagement = systems[0].slotEngagement;
  for (const candidate of systems) {
    if (candidate.slotOpening < system.slotOpening) system = candidate;
    engagement = Math.min(engagement, candidate.slotEngagement);
  }
  return { slotOpening: system.slotOpening, engagement, system };
}

/** The slot of the profiles named in `boundedBy`; the design's own system when none resolve. */
export function panelSlotLimits(
  design: DesignDocument,
  boundedBy: readonly string[] | undefined,
  catalogue: Catalogue = defaultCatalogue,
): SlotLimits | null {
  const systems: ProfileSystem[] = [];
  for (const id of boundedBy ?? []) {
    const profile = design.profiles.find((candidate) => candidate.id === id);
    const variant = profile ? getVariant(catalogue, profile.variantId) : undefined;
    const system = variant ? getSystem(catalogue, variant.systemId) : undefined;
    if (system) systems.push(system);
  }
  if (systems.length > 0) return slotLimitsOf(systems);
  const fallback = getSystem(catalogue, design.systemId);
  return fallback ? slotLimitsOf([fallback]) : null;
}

/**
 * The one slot-fit rule. A captured sheet keeps this clearance to the slot opening, mm, so it slides
 * in past burrs and sheet tolerance (common practice, no source). Generators, the editor's forms and
 * the panel-fit check all use it.
 */
export const SLOT_THICKNESS_CLEARANCE_MM = 1.5;

/** Thickest sheet (mm) a slot of this opening (mm) takes with the clearance. */
export function maxCapturedThickness(slotOpeningMm: number): number {
  return slotOpeningMm - SLOT_THICKNESS_CLEARANCE_MM;
}

/** Whether a sheet of this thickness (mm) slides into a slot of this opening (mm). */
export function sheetFitsSlot(thicknessMm: number, slotOpeningMm: number): boolean {
  return thicknessMm <= maxCapturedThickness(slotOpeningMm) + 1e-9;
}

/** A sheet of this thickness (mm) cannot be captured in the slot. */
export function isThickerThanSlot(thicknessMm: number, limits: SlotLimits): boolean {
  return !sheetFitsSlot(thicknessMm, limits.slotOpening);
}

/** The thickest of these listed thicknesses (mm) that fits the slot opening (mm), or undefined when none does. */
export function thickestFittingThickness(thicknessesMm: readonly number[], slotOpeningMm: number): number | undefined {
  const fits = thicknessesMm.filter((t) => sheetFitsSlot(t, slotOpeningMm));
  return fits.length ? Math.max(...fits) : undefined;
}
