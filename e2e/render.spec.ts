import { expect, test, type Page } from '@playwright/test';
import { largeFrame } from '../bench/largeFrame';
import { signIn } from './helpers';

// quality.md "rendering": a 2,000-profile design in headless Chromium draws in at most 60 draw
// calls (instancing by shape and material), against one call per part in the same run.
const document = largeFrame({ profiles: 2000 });
// The generator builds whole cells, so the count lands near 2,000 (2,004).
const PROFILES = document.profiles.length;
const MAX_DRAW_CALLS = 60;

async function createLargeDesign(page: Page): Promise<number> {
  const response = await page.request.post('/api/designs', {
    headers: { 'X-Slotwise-Client': '1' },
    data: { name: `Render check, ${PROFILES} profiles`, systemId: document.systemId, document },
  });
  expect(response.status(), await response.text()).toBe(201);
  const body = (await response.json()) as { design: { id: number } };
  return body.design.id;
}

async function openAndWaitForParts(page: Page, path: string): Promise<void> {
  await page.goto(path);
  await page.waitForFunction((expected) => window.__slotwiseScene?.stats().profilesDrawn === expected, PROFILES, { timeout: 60_000 });
}

test.describe('editor rendering', () => {
  test.describe.configure({ timeout: 180_000 });

  test('draws a 2,000-profile frame in at most 60 draw calls, far fewer than one per part', async ({ page }) => {
    await signIn(page, 'designer');
    const designId = await createLargeDesign(page);

    await openAndWaitForParts(page, `/designs/${designId}`);
    const instanced = await page.evaluate(() => ({ info: window.__slotwiseScene!.renderInfo(), meshes: window.__slotwiseScene!.instancedMeshCount() }));
    console.log(`[render] instanced: ${instanced.info.calls} draw calls, ${instanced.meshes} instanced meshes, ${instanced.info.triangles} triangles`);
    expect(instanced.info.calls).toBeGreaterThan(0);
    expect(instanced.info.calls).toBeLessThanOrEqual(MAX_DRAW_CALLS);
    expect(instanced.meshes).toBeGreaterThanOrEqual(1);

    await openAndWaitForParts(page, `/designs/${designId}?renderMode=per-part`);
    const perPart = await page.evaluate(() => window.__slotwiseScene!.renderInfo());
    console.log(`[render] per-part: ${perPart.calls} draw calls`);
    // Every profile alone is a call in the per-part baseline, so it must exceed the profile count.
    expect(perPart.calls).toBeGreaterThan(PROFILES);
  });

  test('shows profiles as extrusions with their slots, and maps world points onto the page', async ({ page }) => {
    await signIn(page, 'designer');
    const oneCell = largeFrame({ profiles: 12 });
    const response = await page.request.post('/api/designs', {
      headers: { 'X-Slotwise-Client': '1' },
      data: { name: 'Render check, one cell', systemId: oneCell.systemId, document: oneCell },
    });
    expect(response.status()).toBe(201);
    const { design } = (await response.json()) as { design: { id: number } };
    await page.goto(`/designs/${design.id}`);
    await page.waitForFunction(() => (window.__slotwiseScene?.stats().profilesDrawn ?? 0) === 12, null, { timeout: 60_000 });

    const png = await page.evaluate(() => window.__slotwiseScene!.capturePng(320));
    expect(png.startsWith('data:image/png;base64,')).toBe(true);
    // A blank canvas compresses to almost nothing; a drawn frame does not.
    expect(png.length).toBeGreaterThan(4000);

    const canvas = page.getByTestId('editor-canvas');
    await expect(canvas).toBeVisible();
    const box = (await canvas.boundingBox())!;
    const leg = oneCell.profiles.find((p) => p.id.endsWith('L1'))!;
    const middle: [number, number, number] = [leg.start[0], leg.start[1] + leg.length / 2, leg.start[2]];
    const onPage = await page.evaluate((p) => window.__slotwiseScene!.worldToScreen(p), middle);
    expect(onPage.x).toBeGreaterThan(box.x);
    expect(onPage.x).toBeLessThan(box.x + box.width);
    expect(onPage.y).toBeGreaterThan(box.y);
    expect(onPage.y).toBeLessThan(box.y + box.height);
    await canvas.screenshot({ path: test.info().outputPath('one-cell.png') });
  });
});
