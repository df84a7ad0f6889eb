/** A table: legs, a top frame with a face-mounted top, and an optional lower frame with a shelf. */
import { z } from 'zod';
import type { Catalogue } from '../../catalogue/types';
import { buildFrame, capturedSheet, withGeneratedSteps, type FrameLevel } from './frameBuilder';
import { baseParamsShape, checkCapturedMaterial, checkFrameSize, checkMaterial, panelMaterialId, sizesFor } from './params';
import type { GeneratorDefinition } from './types';

export const tableParamsSchema = z
  .object({
    ...baseParamsShape,
    topMaterialId: panelMaterialId.default('plywood'),
    topThickness: z.number().positive('The top thickness must be greater than 0 mm').max(60, 'The top is at most 60 mm thick').default(18),
    lowerFrame: z.boolean().default(true),
    /** Height of the lower rails' axis above the floor, mm. */
    lowerFrameHeight: z.number().positive('The lower frame height must be greater than 0 mm').default(150),
    lowerShelf: z.boolean().default(true),
    /** Captured shelf material; left out, the first of plywood, HDPE, ACM that fits the slot. */
    shelfMaterialId: panelMaterialId.optional(),
  })
  .superRefine((p, ctx) => {
    const s = checkFrameSize(p, ctx, p.lowerFrame ? 3 : 2);
    checkMaterial(p.topMaterialId, 'topMaterialId', ctx);
    checkMaterial(p.shelfMaterialId, 'shelfMaterialId', ctx);
    if (p.lowerFrame && p.lowerShelf) checkCapturedMaterial(p.shelfMaterialId, 'shelfMaterialId', s, ctx);
    if (!s) return;
    const legTop = p.height - p.topThickness;
    if (p.lowerFrame) {
      const lowest = s.railHeight / 2;
      const highest = legTop - 1.5 * s.railHeight;
      if (p.lowerFrameHeight < lowest || p.lowerFrameHeight > highest) {
        ctx.addIssue({
          code: 'custom',
          path: ['lowerFrameHeight'],
          message: `The lower frame must sit between ${lowest} mm and ${Math.max(lowest, Math.round(highest))} mm so its rails clear the floor and the top rails`,
        });
      }
    }
  });
export type TableParams = z.infer<typeof tableParamsSchema>;

export const tableGenerator: GeneratorDefinition<typeof tableParamsSchema> = {
  id: 'table',
  name: 'Table',
  description: 'Four legs under a top frame and a sheet top; a lower frame and shelf if wanted.',
  paramsSchema: tableParamsSchema,
  defaults: { systemId: 'metric-40', width: 1200, depth: 700, height: 900, feet: 'leveling-foot', topMaterialId: 'plywood', topThickness: 18, lowerFrame: true, lowerFrameHeight: 150, lowerShelf: true },
  generate(p: TableParams, catalogue: Catalogue) {
    const s = sizesFor(p, catalogue)!;
    const legTop = p.height - p.topThickness;
    const levels: FrameLevel[] = [];
    const names: string[] = [];
    if (p.lowerFrame) {
      levels.push({
        y: p.lowerFrameHeight,
        name: 'Lower',
        ...(p.lowerShelf ? { shelf: capturedSheet(catalogue, s.system, p.shelfMaterialId, ['plywood', 'hdpe']) } : {}),
      });
      names.push('Lower');
    }
    levels.push({ y: legTop - s.railHeight / 2, name: 'Top' });
    names.push('Top');
    const frame = buildFrame(
      {
        name: p.name ?? 'Table',
        systemId: p.systemId,
        railVariantId: p.variantId,
        width: p.width,
        depth: p.depth,
        postHeight: legTop,
        levels,
        top: { materialId: p.topMaterialId, thickness: p.topThickness, role: 'shelf' },
        feet: p.feet,
        tags: ['table'],
      },
      catalogue,
    );
    return withGeneratedSteps(frame, catalogue);
  },
};
