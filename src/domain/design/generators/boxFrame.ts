/** A plain rectangular box frame, optionally walled or closed with captured panels. */
import { z } from 'zod';
import type { Catalogue } from '../../catalogue/types';
import { buildFrame, capturedSheet, withGeneratedSteps, type FrameFace } from './frameBuilder';
import { baseParamsShape, checkCapturedMaterial, checkFrameSize, checkMaterial, panelMaterialId, sizesFor } from './params';
import type { GeneratorDefinition } from './types';

export const boxFrameParamsSchema = z
  .object({
    ...baseParamsShape,
    panels: z.enum(['none', 'walls', 'closed']).default('none'),
    /** Captured sheet material; left out, the first of acrylic, polycarbonate, HDPE that fits the slot. */
    panelMaterialId: panelMaterialId.optional(),
  })
  .superRefine((p, ctx) => {
    const s = checkFrameSize(p, ctx, 2);
    checkMaterial(p.panelMaterialId, 'panelMaterialId', ctx);
    checkCapturedMaterial(p.panelMaterialId, 'panelMaterialId', s, ctx);
  });
export type BoxFrameParams = z.infer<typeof boxFrameParamsSchema>;

export const boxFrameGenerator: GeneratorDefinition<typeof boxFrameParamsSchema> = {
  id: 'box-frame',
  name: 'Box frame',
  description: 'Four uprights joined by rails at the bottom and top; panels optional.',
  paramsSchema: boxFrameParamsSchema,
  defaults: { systemId: 'metric-40', width: 600, depth: 400, height: 500, feet: 'leveling-foot', panels: 'none' },
  generate(p: BoxFrameParams, catalogue: Catalogue) {
    const s = sizesFor(p, catalogue)!;
    const half = s.railHeight / 2;
    const panel = capturedSheet(catalogue, s.system, p.panelMaterialId, ['acrylic', 'polycarbonate']);
    const faces: FrameFace[] = p.panels === 'none' ? [] : ['back', 'left', 'right', 'front'];
    const closed = p.panels === 'closed';
    const frame = buildFrame(
      {
        name: p.name ?? 'Box frame',
        systemId: p.systemId,
        railVariantId: p.variantId,
        width: p.width,
        depth: p.depth,
        postHeight: p.height,
        levels: [
          { y: half, name: 'Bottom', ...(closed ? { shelf: { ...panel, role: 'panel' as const } } : {}) },
          { y: p.height - half, name: 'Top', ...(closed ? { shelf: { ...panel, role: 'panel' as const } } : {}) },
        ],
        walls: faces.length ? { faces, panel } : undefined,
        feet: p.feet,
        tags: ['box-frame'],
      },
      catalogue,
    );
    return withGeneratedSteps(frame, catalogue);
  },
};
