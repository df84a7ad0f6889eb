import { describe, expect, it } from 'vitest';
import jsQR from 'jsqr';
import { PNG } from 'pngjs';
import { analyzeDesign } from '@/domain/analysis/analyze';
import { buildInstructions, buildStepPath, designCautions, firstStepOfPiece, LABEL_GRID, labelSheets, pieceLabels, TWO_PERSON_LIFT_KG, wallCaution } from '@/domain/buildInstructions';
import { demoDesigns } from '@/domain/fixtures';
import { labelQrDataUrl } from '@/features/workbench/labels/labelQr';

const enclosure = demoDesigns.find((design) => design.name === 'Two-level printer enclosure')!;
const analysis = analyzeDesign(enclosure, undefined, { timings: false });
const steps = buildInstructions(enclosure, analysis);

function decodeDataUrl(dataUrl: string): string | null {
  const png = PNG.sync.read(Buffer.from(dataUrl.split(',')[1], 'base64'));
  return jsQR(new Uint8ClampedArray(png.data), png.width, png.height)?.data ?? null;
}

describe('build instructions', () => {
  it('follows the design’s own steps, in order, with their parts', () => {
    expect(steps.map((step) => step.id)).toEqual(enclosure.steps.map((step) => step.id));
    expect(steps[0].parts.map((part) => part.id)).toEqual(['p-1', 'p-2', 'p-3', 'p-4']);
  });

  it('counts each step’s fasteners exactly, and the steps together match the bill of materials', () => {
    const stepScrews = steps.flatMap((step) => step.hardware).filter((line) => line.category === 'fastener').reduce((sum, line) => sum + line.quantity, 0);
    const bomScrews = analysis.bom.filter((line) => line.category === 'fastener').reduce((sum, line) => sum + line.quantity, 0);
    expect(stepScrews).toBe(bomScrews);
    // Step 2 closes six corner brackets (j-1, j-2, j-5 … j-8); the catalogue gives a bracket 2 screws → 12.
    expect(steps[1].hardware.find((line) => line.category === 'fastener')?.quantity).toBe(12);
    expect(steps[1].tools.some((tool) => tool.kind === 'hex-key')).toBe(true);
  });

  it('gives the cover the cautions the enclosure calls for: two people above 25 kg, eyes at the saw, a 1.4 m frame secured to a wall', () => {
    // 25 kg two-person lift, 1200 mm wall height: common practice, no source.
    expect(analysis.mass.total).toBeGreaterThan(TWO_PERSON_LIFT_KG);
    expect(designCautions(analysis).map((caution) => caution.kind)).toEqual(['two-person-lift', 'eye-protection', 'secure-to-wall']);
    expect(steps.at(-1)!.cautions.map((caution) => caution.kind)).toContain('secure-to-wall');
    expect(steps.flatMap((step) => step.cautions).filter((caution) => caution.kind === 'two-person-lift').length).toBeGreaterThan(0);
  });

  it('leaves a low, wide frame free of the wall caution', () => {
    expect(wallCaution({ x: 1200, y: 800, z: 600 })).toBeNull();
    expect(wallCaution({ x: 300, y: 900, z: 300 })?.kind).toBe('secure-to-wall');
  });
});

describe('piece labels', () => {
  const first = firstStepOfPiece(steps, enclosure);
  const labels = pieceLabels(enclosure, analysis.cutList, first, { id: 7, revision: 3 });

  it('makes one label per cut piece with its length in the design’s units and its machining', () => {
    expect(labels).toHaveLength(analysis.cutList.length);
    const upright = labels.find((label) => label.pieceId === 'p-1')!;
    expect(upright).toMatchObject({ length: '1400 mm', designName: 'Two-level printer enclosure', revision: 3, buildId: 7, stepId: 'step-1' });
    expect(upright.machining.join(' ')).toMatch(/Tap M8/);
  });

  it('lays the labels on A4 sheets of 3 × 8 labels of 70 × 37 mm that fit the sheet', () => {
    const { sheet, columns, rows, label, margin } = LABEL_GRID;
    expect(columns * label.width + margin.left).toBeLessThanOrEqual(sheet.width);
    expect(rows * label.height + margin.top).toBeLessThanOrEqual(sheet.height);
    expect(labelSheets(Array.from({ length: 25 }, (_, index) => index)).map((page) => page.length)).toEqual([24, 1]);
  });

  it('prints a QR code that decodes to the build opened at the first step using the piece', async () => {
    const rail = labels.find((label) => label.pieceId === 'p-5')!;
    // p-5 is the back bottom rail, first placed in step 2 ("Bottom rails: back and sides").
    expect(rail.stepId).toBe('step-2');
    const url = `https://shop.example${buildStepPath(rail.buildId, rail.stepId)}`;
    expect(decodeDataUrl(await labelQrDataUrl(url))).toBe('https://shop.example/workbench/builds/7?tab=build&step=step-2');
  });
});
