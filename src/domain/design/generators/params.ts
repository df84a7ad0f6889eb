/** Parameter pieces shared by the generators, and the checks that need the profile size. */
import { z } from 'zod';
import { defaultCatalogue, getSystem, getVariant } from '../../catalogue';
import { SYSTEM_IDS, type Catalogue, type ProfileSystem, type ProfileVariant } from '../../catalogue/types';
import { fittingThickness } from './frameBuilder';

const mm = (what: string) =>
  z
    .number({ error: `${what} must be a number of millimetres` })
    .refine(Number.isFinite, `${what} must be a finite number`)
    .refine((v) => v > 0, `${what} must be greater than 0 mm`)
    .refine((v) => v <= 20000, `${what} is at most 20,000 mm`);

export const baseParamsShape = {
  name: z.string().trim().min(1, 'A design needs a name').max(120).optional(),
  systemId: z.enum(SYSTEM_IDS, { error: `Pick a profile system: ${SYSTEM_IDS.join(', ')}` }),
  /** Rail variant (e.g. the 40 x 80 profile); uprights stay square. */
  variantId: z.string().optional(),
  width: mm('Width'),
  depth: mm('Depth'),
  height: mm('Height'),
  feet: z.enum(['leveling-foot', 'caster', 'none']).default('leveling-foot'),
};

export const panelMaterialId = z.string().min(1, 'Pick a panel material');

export interface SizedParams {
  systemId: string;
  variantId?: string;
  width: number;
  depth: number;
  height: number;
}

export interface ProfileSizes {
  system: ProfileSystem;
  post: ProfileVariant;
  rail: ProfileVariant;
  /** Upright size, mm. */
  size: number;
  /** Rail height, mm. */
  railHeight: number;
}

export function sizesFor(p: SizedParams, catalogue: Catalogue = defaultCatalogue): ProfileSizes | undefined {
  const system = getSystem(catalogue, p.systemId);
  if (!system) return undefined;
  const post = getVariant(catalogue, system.defaultVariantId)!;
  const rail = (p.variantId ? getVariant(catalogue, p.variantId) : undefined) ?? post;
  return { system, post, rail, size: post.width, railHeight: rail.height };
}

/** Width, depth and height checks common to every frame, with the size in the message. */
export function checkFrameSize(p: SizedParams, ctx: z.RefinementCtx, minHeightRails = 2): ProfileSizes | undefined {
  if (p.variantId !== undefined) {
    const v = getVariant(defaultCatalogue, p.variantId);
    if (!v) ctx.addIssue({ code: 'custom', path: ['variantId'], message: `Unknown profile variant "${p.variantId}"` });
    else if (v.systemId !== p.systemId) ctx.addIssue({ code: 'custom', path: ['variantId'], message: `Profile ${v.name} belongs to ${v.systemId}, not ${p.systemId}` });
  }
  const s = sizesFor(p);
  if (!s) return undefined;
  const min = 3 * s.size;
  if (p.width < min) ctx.addIssue({ code: 'custom', path: ['width'], message: `Width must be at least 3 × the profile size (${min} mm)` });
  if (p.depth < min) ctx.addIssue({ code: 'custom', path: ['depth'], message: `Depth must be at least 3 × the profile size (${min} mm)` });
  const minHeight = Math.max(2 * s.size, minHeightRails * s.railHeight + s.size);
  if (p.height < minHeight) {
    ctx.addIssue({ code: 'custom', path: ['height'], message: `Height must be at least ${minHeight} mm (${(minHeight / s.size).toFixed(1)} × the profile size) for this frame` });
  }
  return s;
}

export function checkMaterial(id: string | undefined, path: string, ctx: z.RefinementCtx): void {
  if (id !== undefined && !defaultCatalogue.panelMaterials.some((m) => m.id === id)) {
    ctx.addIssue({ code: 'custom', path: [path], message: `Unknown panel material "${id}"; use one of ${defaultCatalogue.panelMaterials.map((m) => m.id).join(', ')}` });
  }
}

/** A captured sheet of this material must come thin enough to fit the slot. */
export function checkCapturedMaterial(id: string | undefined, path: string, sizes: ProfileSizes | undefined, ctx: z.RefinementCtx): void {
  if (id === undefined || !sizes) return;
  const material = defaultCatalogue.panelMaterials.find((m) => m.id === id);
  if (!material) return;
  if (fittingThickness(defaultCatalogue, sizes.system, id) === undefined) {
    ctx.addIssue({
      code: 'custom',
      path: [path],
      message: `${material.name} is not listed thin enough for the ${sizes.system.name} slot (${sizes.system.slotOpening} mm opening); pick a thinner material`,
    });
  }
}
