// @vitest-environment jsdom
import { unzipSync, strFromU8 } from 'three/examples/jsm/libs/fflate.module.js';
import { describe, expect, it } from 'vitest';
import { demoDesigns } from '@/domain/fixtures';
import { designToUsdz } from '@/lib/usdzExport';

describe('USDZ export for phones that open it in their AR viewer', () => {
  it.each(demoDesigns.map((design) => [design.name, design] as const))('"%s" is a zip whose first file is a USD text scene naming every profile and panel, in metres', async (_name, design) => {
    const usdz = await designToUsdz(design);
    // Local file header signature "PK\x03\x04" (PKWARE APPNOTE.TXT 4.3.7).
    expect([...usdz.subarray(0, 4)]).toEqual([0x50, 0x4b, 0x03, 0x04]);
    const files = unzipSync(usdz);
    const names = Object.keys(files);
    // A USDZ package's first file is its default layer, a .usda/.usdc/.usd file (Pixar, "Usdz File Format Specification").
    expect(names[0]).toMatch(/\.usd[ac]?$/);
    const usda = names.filter((name) => name.endsWith('.usda')).map((name) => strFromU8(files[name])).join('\n');
    expect(usda).toContain('metersPerUnit = 1');
    expect(usda).toContain('upAxis = "Y"');
    // Anchored on a floor or table so the phone places it at true scale.
    expect(usda).toContain('preliminary:planeAnchoring:alignment = "horizontal"');
    // The frame group scales the document's millimetres to metres.
    expect(usda).toContain('matrix4d xformOp:transform = ( (0.001, 0, 0, 0), (0, 0.001, 0, 0), (0, 0, 0.001, 0), (0, 0, 0, 1) )');
    // One node per profile and panel, named by part id, each referring to a mesh file in the package.
    const nodes = new Set([...usda.matchAll(/def Xform "([^"]+)"/g)].map((match) => match[1]));
    for (const part of [...design.profiles, ...(design.panels ?? [])]) expect(nodes, part.id).toContain(part.id.replace(/[^A-Za-z0-9_]/g, ''));
    const geometryFiles = names.filter((name) => name.startsWith('geometries/'));
    expect(geometryFiles.length).toBeGreaterThanOrEqual(1);
    for (const name of geometryFiles) expect(strFromU8(files[name])).toContain('def Mesh');
  });
});
