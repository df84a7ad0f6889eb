import { defaultCatalogue, getSystem, getVariant, type Catalogue, type ProfileSystem } from '@/domain/catalogue';
import type { DesignDocument, Panel } from '@/domain/design/schema';
import { isThickerThanSlot, SLOT_THICKNESS_CLEARANCE_MM, type SlotLimits } from '@/domain/design/slotLimits';
import { formatLength, type LengthUnit } from '@/domain/units';

/** The profile system holding a panel (for its hardware): that of its first bounding profile, else the design's. */
export function panelSystem(design: DesignDocument, panel: Pick<Panel, 'boundedBy'>, catalogue: Catalogue = defaultCatalogue): ProfileSystem | undefined {
  const firstProfileId = panel.boundedBy?.[0];
  const profile = firstProfileId ? design.profiles.find((candidate) => candidate.id === firstProfileId) : undefined;
  const variant = profile ? getVariant(catalogue, profile.variantId) : undefined;
  return getSystem(catalogue, variant?.systemId ?? design.systemId);
}

/** Why a sheet of this thickness cannot be captured in the slot around it, or null when it fits (same rule as the panel-fit check). */
export function capturedThicknessProblem(thicknessMm: number, limits: SlotLimits | null, units: LengthUnit): string | null {
  if (!limits || !isThickerThanSlot(thicknessMm, limits)) return null;
  return `A ${formatLength(thicknessMm, units)} sheet is too thick for the ${formatLength(limits.slotOpening, units)} slot opening of ${limits.system.name} profiles (a sheet keeps ${formatLength(SLOT_THICKNESS_CLEARANCE_MM, units)} clearance), so it cannot slide into the slot. Choose a thinner sheet or mount it on the face.`;
}
