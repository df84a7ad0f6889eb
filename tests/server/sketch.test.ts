import sharp from 'sharp';
import { describe, expect, it } from 'vitest';
import { createEmptyDesign } from '../../src/domain/design/create';
import { demoDesignByName } from '../../src/domain/fixtures';
import { sketchDesignPng } from '../../server/modules/designs/sketch';

const alphaOf = async (png: Buffer) => {
  const { data, info } = await sharp(png).raw().toBuffer({ resolveWithObject: true });
  return { at: (x: number, y: number) => data[(y * info.width + x) * 4 + 3], data, info };
};

describe('the server-drawn picture of a design', () => {
  it('draws the same bytes for the same design, so seeding is repeatable', async () => {
    const design = demoDesignByName('Plant rack')!;
    expect((await sketchDesignPng(design)).equals(await sketchDesignPng(design))).toBe(true);
  });

  it('leaves a design with no parts as a fully transparent picture', async () => {
    const { data } = await alphaOf(await sketchDesignPng(createEmptyDesign({ name: 'Empty', systemId: 'metric-40' })));
    expect(data.filter((_, i) => i % 4 === 3).every((alpha) => alpha === 0)).toBe(true);
  });

  it('centres the design and keeps a clear margin round it', async () => {
    const { at, info } = await alphaOf(await sketchDesignPng(demoDesignByName('Standing workbench')!));
    for (let x = 0; x < info.width; x++) {
      expect(at(x, 0)).toBe(0);
      expect(at(x, info.height - 1)).toBe(0);
    }
    for (let y = 0; y < info.height; y++) {
      expect(at(0, y)).toBe(0);
      expect(at(info.width - 1, y)).toBe(0);
    }
    // The drawn area is centred and fills the picture on one side (7 % margin each side of 320 × 240).
    let [minX, maxX, minY, maxY] = [Infinity, -Infinity, Infinity, -Infinity];
    for (let y = 0; y < info.height; y++) {
      for (let x = 0; x < info.width; x++) {
        if (at(x, y) < 128) continue;
        [minX, maxX, minY, maxY] = [Math.min(minX, x), Math.max(maxX, x), Math.min(minY, y), Math.max(maxY, y)];
      }
    }
    expect(Math.abs((minX + maxX) / 2 - info.width / 2)).toBeLessThan(3);
    expect(Math.abs((minY + maxY) / 2 - info.height / 2)).toBeLessThan(3);
    expect(Math.max((maxX - minX) / info.width, (maxY - minY) / info.height)).toBeGreaterThan(0.82);
  });
});
