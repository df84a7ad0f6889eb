/** An enclosure: compartments stacked one above the other, walls and top captured, hinged doors in front. */
import { z } from 'zod';
import type { Catalogue } from '../../catalogue/types';
import { buildFrame, capturedSheet, withGeneratedSteps } from './frameBuilder';
import { baseParamsShape, checkCapturedMaterial, checkFrameSize, checkMaterial, panelMaterialId, sizesFor } from './params';
import type { GeneratorDefinition } from './types';

export const enclosureParamsSchema = z
  .object({
    ...baseParamsShape,
    compartments: z.number().int('Compartments must be a whole number').min(1, 'An enclosure has at least 1 compartment').max(4, 'An enclosure has at most 4 compartments').default(1),
    wallMaterialId: panelMaterialId.default('acrylic'),
    /** Captured shelf material; left out, the first of plywood, HDPE, ACM that fits the slot. */
    shelfMaterialId: panelMaterialId.optional(),
    doorMaterialId: panelMaterialId.default('acrylic'),
    doorThickness: z.number().positive('The door thickness must be greater than 0 mm').max(20, 'A door sheet is at most 20 mm thick').default(5),
  })
  .superRefine((p, ctx) => {
    const s = checkFrameSize(p, ctx, p.compartments + 1);
    for (const key of ['wallMaterialId', 'shelfMaterialId', 'doorMaterialId'] as const) checkMaterial(p[key], key, ctx);
    for (const key of ['wallMaterialId', 'shelfMaterialId'] as const) checkCapturedMaterial(p[key], key, s, ctx);
    if (!s) return;
    const gap = (p.height - s.railHeight) / p.compartments;
    if (gap < 3 * s.railHeight) {
      ctx.addIssue({ code: 'custom', path: ['compartments'], message: `Too many compartments for this height: each would be ${Math.round(gap)} mm; allow at least ${3 * s.railHeight} mm` });
    }
  });
export type EnclosureParams = z.infer<typeof enclosureParamsSchema>;

export const enclosureGenerator: GeneratorDefinition<typeof enclosureParamsSchema> = {
  id: 'enclosure',
  name: 'Enclosure with doors',
  description: 'Closed compartments stacked one above the other, each with a hinged front door.',
  paramsSchema: enclosureParamsSchema,
  defaults: { systemId: 'metric-40', width: 700, depth: 650, height: 800, feet: 'leveling-foot', compartments: 1, wallMaterialId: 'acrylic', doorMaterialId: 'acrylic', doorThickness: 5 },
  generate(p: EnclosureParams, catalogue: Catalogue) {
    const s = sizesFor(p, catalogue)!;
    const half = s.railHeight / 2;
    const gap = (p.height - s.railHeight) / p.compartments;
    const fit = (id: string | undefined) => capturedSheet(catalogue, s.system, id, ['plywood', 'hdpe']);
    const names = Array.from({ length: p.compartments + 1 }, (_, k) => (k === 0 ? 'Bottom' : k === p.compartments ? 'Top' : `Level ${k + 1}`));
    const levels = names.map((name, k) => ({
      y: Math.round((half + gap * k) * 1000) / 1000,
      name,
      shelf: k === p.compartments ? { ...fit(p.wallMaterialId), role: 'panel' as const, label: 'Top panel' } : fit(p.shelfMaterialId),
    }));
    const frame = buildFrame(
      {
        name: p.name ?? 'Enclosure',
        systemId: p.systemId,
        railVariantId: p.variantId,
        width: p.width,
        depth: p.depth,
        postHeight: p.height,
        levels,
        walls: { faces: ['back', 'left', 'right'], panel: fit(p.wallMaterialId) },
        doors: { materialId: p.doorMaterialId, thickness: p.doorThickness },
        feet: p.feet,
        tags: ['enclosure'],
      },
      catalogue,
    );
    return withGeneratedSteps(frame, catalogue);
  },
};
