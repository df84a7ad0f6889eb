/**
 * A cabinet built from two side frames (sub-assemblies built lying on their side), joined by
 * cross members: the left side stands first, the cross members, shelves and back panel go onto
 * it, and the right side slides in along −X to close everything.
 */
import { z } from 'zod';
import type { Catalogue } from '../../catalogue/types';
import { generateSteps } from '../../assembly/generateSteps';
import { createIdAllocator } from '../ids';
import type { SubAssembly, Vec3 } from '../schema';
import { buildFrame, capturedSheet } from './frameBuilder';
import { baseParamsShape, checkCapturedMaterial, checkFrameSize, checkMaterial, panelMaterialId, sizesFor } from './params';
import type { GeneratorDefinition } from './types';

export const cabinetParamsSchema = z
  .object({
    ...baseParamsShape,
    shelves: z.number().int('Shelves must be a whole number').min(0, 'Shelves cannot be negative').max(8, 'A cabinet has at most 8 inner shelves').default(1),
    /** Captured wall and top material; left out, whichever of ACM, HDPE, ABS fits the slot most snugly. */
    panelMaterialId: panelMaterialId.optional(),
    /** Captured shelf material; left out, the first of plywood, HDPE, ACM that fits the slot. */
    shelfMaterialId: panelMaterialId.optional(),
    doors: z.boolean().default(true),
    doorMaterialId: panelMaterialId.default('acm'),
    doorThickness: z.number().positive('The door thickness must be greater than 0 mm').max(20, 'A door sheet is at most 20 mm thick').default(4),
  })
  .superRefine((p, ctx) => {
    const s = checkFrameSize(p, ctx, p.shelves + 2);
    for (const key of ['panelMaterialId', 'shelfMaterialId', 'doorMaterialId'] as const) checkMaterial(p[key], key, ctx);
    for (const key of ['panelMaterialId', 'shelfMaterialId'] as const) checkCapturedMaterial(p[key], key, s, ctx);
    if (!s) return;
    const gap = (p.height - s.railHeight) / (p.shelves + 1);
    if (gap < 3 * s.railHeight) {
      ctx.addIssue({ code: 'custom', path: ['shelves'], message: `Too many shelves for this height: shelves would be ${Math.round(gap)} mm apart; allow at least ${3 * s.railHeight} mm` });
    }
  });
export type CabinetParams = z.infer<typeof cabinetParamsSchema>;

export const cabinetGenerator: GeneratorDefinition<typeof cabinetParamsSchema> = {
  id: 'cabinet',
  name: 'Cabinet from two side frames',
  description: 'Two side frames built flat, joined by cross members; shelves, back panel and doors.',
  paramsSchema: cabinetParamsSchema,
  defaults: { systemId: 'metric-30', width: 800, depth: 500, height: 1000, feet: 'leveling-foot', shelves: 1, doors: true, doorMaterialId: 'acm', doorThickness: 4 },
  generate(p: CabinetParams, catalogue: Catalogue) {
    const s = sizesFor(p, catalogue)!;
    const half = s.railHeight / 2;
    const gap = (p.height - s.railHeight) / (p.shelves + 1);
    const fit = (id: string | undefined) => capturedSheet(catalogue, s.system, id, ['plywood', 'hdpe']);
    const walls = capturedSheet(catalogue, s.system, p.panelMaterialId, ['acm', 'hdpe', 'abs']);
    const count = p.shelves + 2;
    const names = Array.from({ length: count }, (_, k) => (k === 0 ? 'Bottom' : k === count - 1 ? 'Top' : `Shelf ${k}`));
    const levels = names.map((name, k) => ({
      y: Math.round((half + gap * k) * 1000) / 1000,
      name,
      shelf: k === count - 1 ? { ...walls, role: 'panel' as const, label: 'Top panel' } : fit(p.shelfMaterialId),
    }));
    const frame = buildFrame(
      {
        name: p.name ?? 'Cabinet',
        systemId: p.systemId,
        railVariantId: p.variantId,
        width: p.width,
        depth: p.depth,
        postHeight: p.height,
        levels,
        walls: { faces: ['back', 'left', 'right'], panel: walls },
        ...(p.doors ? { doors: { materialId: p.doorMaterialId, thickness: p.doorThickness } } : {}),
        feet: p.feet,
        tags: ['cabinet'],
      },
      catalogue,
    );
    const ids = createIdAllocator(frame.design);
    const sideOf = (side: 'left' | 'right', joinDirection: Vec3): SubAssembly => {
      const posts = side === 'left' ? [frame.posts.frontLeft, frame.posts.backLeft] : [frame.posts.frontRight, frame.posts.backRight];
      return {
        id: ids.next('sub'),
        name: side === 'left' ? 'Left side frame' : 'Right side frame',
        profileIds: [...posts, ...frame.rails.map((r) => r[side])],
        panelIds: frame.walls.map((b) => b[side]).filter((x): x is string => !!x),
        buildOrientation: 'on-side',
        joinDirection,
      };
    };
    const subs = { left: sideOf('left', [1, 0, 0]), right: sideOf('right', [-1, 0, 0]) };
    const design = { ...frame.design, subAssemblies: [subs.left, subs.right] };
    return { ...design, steps: generateSteps(design, catalogue) };
  },
};
