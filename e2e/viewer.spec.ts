import { expect, test, type Page } from '@playwright/test';
import { signIn } from './helpers';

/** The seeded demo enclosure's id, looked up through the API as the signed-in designer. */
async function enclosureId(page: Page): Promise<number> {
  const response = await page.request.get('/api/designs', { headers: { 'X-Slotwise-Client': '1' } });
  expect(response.ok()).toBe(true);
  const body = (await response.json()) as { designs: { id: number; name: string }[] };
  const design = body.designs.find((d) => /enclosure/i.test(d.name));
  expect(design, 'the demo shop has an enclosure design').toBeDefined();
  return design!.id;
}

async function waitForScene(page: Page): Promise<void> {
  await page.waitForFunction(() => (window.__slotwiseScene?.stats().profilesDrawn ?? 0) > 0, null, { timeout: 60_000 });
}

/** The canvas as a small PNG, rendered and read in one task by the scene's test hook. */
async function canvasImage(page: Page): Promise<string> {
  return page.evaluate(() => window.__slotwiseScene!.capturePng(360));
}

/** Waits for the current step's parts to arrive (travel is under a second) and the camera to settle. */
async function settle(page: Page): Promise<void> {
  await page.waitForTimeout(1600);
}

test('the viewer page plays the sequence and steps through it, with no editing control', async ({ page }, testInfo) => {
  test.setTimeout(180_000);
  await page.setViewportSize({ width: 1440, height: 900 });
  await signIn(page, 'designer');
  const id = await enclosureId(page);
  await page.goto(`/designs/${id}/view`);
  await waitForScene(page);
  await expect(page.getByTestId('viewer-canvas')).toBeVisible();

  // Read only: none of the editor's controls is here.
  for (const name of [/^Save$/, /undo/i, /redo/i, /^Draw$/, /Frame starters/, /^Pick$/, /^Fill$/]) {
    await expect(page.getByRole('button', { name })).toHaveCount(0);
  }
  await expect(page.getByTestId('editor-canvas')).toHaveCount(0);
  await expect(page.getByRole('complementary', { name: 'Inspector' })).toHaveCount(0);

  const player = page.getByRole('complementary', { name: 'Steps and parts' }).getByTestId('step-player');
  const current = player.getByTestId('current-step');
  await expect(current).toContainText(/Step \d+ of \d+/);
  const total = Number((await current.textContent())!.match(/of (\d+)/)![1]);
  expect(total, 'the demo enclosure has at least four steps').toBeGreaterThanOrEqual(4);

  // Play from the start, then pause: the first step is shown.
  await player.getByRole('button', { name: 'Play' }).click();
  await expect(current).toContainText(`Step 1 of ${total}`);
  await player.getByRole('button', { name: 'Pause' }).click();
  await settle(page);
  // Playing may have moved on a step before the pause landed: start from wherever it stopped.
  const start = Number((await current.textContent())!.match(/Step (\d+)/)![1]);
  expect(start).toBeLessThanOrEqual(total - 3);
  await page.screenshot({ path: testInfo.outputPath(`viewer-step-${start}.png`) });
  let previous = await canvasImage(page);

  // Step forward three times (buttons twice, the arrow key once): the picture changes every time.
  for (let i = start + 1; i <= start + 3; i++) {
    if (i === start + 2) await page.keyboard.press('ArrowRight');
    else await player.getByRole('button', { name: 'Next step' }).click();
    await expect(current).toContainText(`Step ${i} of ${total}`);
    await settle(page);
    const image = await canvasImage(page);
    expect(image, `the canvas differs between step ${i - 1} and step ${i}`).not.toEqual(previous);
    await page.screenshot({ path: testInfo.outputPath(`viewer-step-${i}.png`) });
    previous = image;
  }

  // The bill of materials is one tab away.
  await page.getByRole('complementary', { name: 'Steps and parts' }).getByRole('tab', { name: 'Parts' }).click();
  await expect(page.getByRole('complementary', { name: 'Steps and parts' }).getByRole('table')).toBeVisible();
});

for (const viewport of [
  { width: 390, height: 844, name: 'phone' },
  { width: 768, height: 1024, name: 'tablet-portrait' },
  { width: 1024, height: 768, name: 'tablet-landscape' },
]) {
  test(`the viewer page fits a ${viewport.width} x ${viewport.height} screen`, async ({ page }, testInfo) => {
    test.setTimeout(120_000);
    await signIn(page, 'designer');
    const id = await enclosureId(page);
    await page.setViewportSize({ width: viewport.width, height: viewport.height });
    await page.goto(`/designs/${id}/view`);
    await waitForScene(page);

    const overflow = await page.evaluate(() => document.documentElement.scrollWidth - window.innerWidth);
    expect(overflow, 'no page scrolls sideways').toBeLessThanOrEqual(0);
    const canvas = (await page.getByTestId('viewer-canvas').boundingBox())!;
    expect((canvas.width * canvas.height) / (viewport.width * viewport.height), 'the canvas keeps at least half the screen').toBeGreaterThanOrEqual(0.5);

    // The viewer opens on the finished piece: previous, next and play are all within reach.
    const previousStep = page.getByRole('button', { name: 'Previous step' }).filter({ visible: true });
    await expect(previousStep).toBeInViewport();
    await expect(page.getByRole('button', { name: 'Next step' }).filter({ visible: true })).toBeInViewport();
    await expect(page.getByRole('button', { name: 'Play' }).filter({ visible: true })).toBeInViewport();
    await previousStep.click();
    await expect(page.getByTestId('current-step').filter({ visible: true })).toContainText(/Step \d+ of \d+/);
    await page.screenshot({ path: testInfo.outputPath(`viewer-${viewport.name}.png`) });

    if (viewport.width < 1024) {
      // Pull the sheet up: the steps list shows, the page still does not scroll sideways.
      await page.getByRole('button', { name: /Pull up for steps and parts/ }).click();
      await expect(page.getByRole('list', { name: 'Assembly steps' })).toBeVisible();
      const overflowOpen = await page.evaluate(() => document.documentElement.scrollWidth - window.innerWidth);
      expect(overflowOpen).toBeLessThanOrEqual(0);
      await page.screenshot({ path: testInfo.outputPath(`viewer-${viewport.name}-sheet.png`) });
    }
  });
}
