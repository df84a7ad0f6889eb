/** A shelf unit: N evenly spaced levels, each with a captured shelf; back or side walls optional. */
import { z } from 'zod';
import type { Catalogue } from '../../catalogue/types';
import { buildFrame, capturedSheet, withGeneratedSteps, type FrameFace } from './frameBuilder';
import { baseParamsShape, checkCapturedMaterial, checkFrameSize, checkMaterial, panelMaterialId, sizesFor } from './params';
import type { GeneratorDefinition } from './types';

export const shelfUnitParamsSchema = z
  .object({
    ...baseParamsShape,
    shelves: z.number().int('Shelves must be a whole number').min(2, 'A shelf unit has at least 2 shelves').max(12, 'A shelf unit has at most 12 shelves').default(4),
    /** Captured shelf material; left out, whichever of plywood, HDPE, ACM fits the slot most snugly. */
    shelfMaterialId: panelMaterialId.optional(),
    walls: z.enum(['none', 'back', 'back-and-sides']).default('none'),
    /** Captured wall material; left out, whichever of ACM, HDPE fits the slot most snugly. */
    wallMaterialId: panelMaterialId.optional(),
  })
  .superRefine((p, ctx) => {
    const s = checkFrameSize(p, ctx, 2);
    checkMaterial(p.shelfMaterialId, 'shelfMaterialId', ctx);
    checkMaterial(p.wallMaterialId, 'wallMaterialId', ctx);
    checkCapturedMaterial(p.shelfMaterialId, 'shelfMaterialId', s, ctx);
    if (p.walls !== 'none') checkCapturedMaterial(p.wallMaterialId, 'wallMaterialId', s, ctx);
    if (!s) return;
    const gap = (p.height - s.railHeight) / (p.shelves - 1);
    if (gap < 3 * s.railHeight) {
      ctx.addIssue({ code: 'custom', path: ['shelves'], message: `Too many shelves for this height: shelves would be ${Math.round(gap)} mm apart; allow at least ${3 * s.railHeight} mm (3 × the rail height)` });
    }
  });
export type ShelfUnitParams = z.infer<typeof shelfUnitParamsSchema>;

export const shelfUnitGenerator: GeneratorDefinition<typeof shelfUnitParamsSchema> = {
  id: 'shelf-unit',
  name: 'Shelf unit',
  description: 'Evenly spaced shelves captured in rail frames between four uprights.',
  paramsSchema: shelfUnitParamsSchema,
  defaults: { systemId: 'metric-30', width: 800, depth: 400, height: 1500, feet: 'leveling-foot', shelves: 4, walls: 'none' },
  generate(p: ShelfUnitParams, catalogue: Catalogue) {
    const s = sizesFor(p, catalogue)!;
    const half = s.railHeight / 2;
    const gap = (p.height - s.railHeight) / (p.shelves - 1);
    const shelf = capturedSheet(catalogue, s.system, p.shelfMaterialId, ['plywood', 'hdpe', 'acm']);
    const names = Array.from({ length: p.shelves }, (_, k) => (k === 0 ? 'Bottom' : k === p.shelves - 1 ? 'Top' : `Shelf ${k + 1}`));
    const levels = names.map((name, k) => ({ y: Math.round((half + gap * k) * 1000) / 1000, name, shelf }));
    const faces: FrameFace[] = p.walls === 'none' ? [] : p.walls === 'back' ? ['back'] : ['back', 'left', 'right'];
    const frame = buildFrame(
      {
        name: p.name ?? 'Shelf unit',
        systemId: p.systemId,
        railVariantId: p.variantId,
        width: p.width,
        depth: p.depth,
        postHeight: p.height,
        levels,
        walls: faces.length ? { faces, panel: capturedSheet(catalogue, s.system, p.wallMaterialId, ['acm', 'hdpe']) } : undefined,
        feet: p.feet,
        tags: ['shelf-unit'],
      },
      catalogue,
    );
    return withGeneratedSteps(frame, catalogue);
  },
};
