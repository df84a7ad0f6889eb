import { expect, test, type Page } from '@playwright/test';
import { signIn } from './helpers';

/** The canvas as a small PNG, rendered and read in one task by the scene's test hook. */
async function canvasImage(page: Page): Promise<string> {
  return page.evaluate(() => window.__slotwiseScene!.capturePng(360));
}

test('an instructor shares a class link; an anonymous visitor views it read-only and steps through the sequence; revoking the class stops it', async ({ page, browser }, testInfo) => {
  // Three browser contexts and two 3D views on a shared machine: allow more than the default.
  test.setTimeout(240_000);
  await signIn(page, 'instructor');
  await page.getByRole('button', { name: 'New class' }).first().click();
  await page.getByLabel('Name').fill('Frames 101');
  await page.getByLabel('Description').fill('Week 3: enclosures');
  await page.getByRole('button', { name: 'Create class' }).click();
  await expect(page.getByRole('heading', { name: 'Frames 101' })).toBeVisible();
  await page.getByRole('button', { name: 'Add link' }).click();
  // Other specs add designs to the same shop; link the demo enclosure by name.
  await page.getByLabel('Design').selectOption({ label: 'Two-level printer enclosure' });
  await page.getByRole('button', { name: 'Make link' }).click();
  const url = await page.getByTestId('new-link-url').inputValue();
  expect(url).toMatch(/\/view\/[A-Za-z0-9_-]{43}$/);
  const token = url.split('/view/')[1];
  await page.getByRole('button', { name: 'Copy and close' }).click();

  const visitorContext = await browser.newContext();
  const visitor = await visitorContext.newPage();
  await visitor.goto(`/view/${token}`);
  await expect(visitor.getByTestId('link-viewer')).toBeVisible({ timeout: 60_000 });
  const canvas = visitor.locator('canvas').first();
  await expect(canvas).toBeVisible({ timeout: 60_000 });
  // Orbit: drag across the view.
  const box = (await canvas.boundingBox())!;
  await visitor.mouse.move(box.x + box.width / 2, box.y + box.height / 2);
  await visitor.mouse.down();
  await visitor.mouse.move(box.x + box.width / 2 + 120, box.y + box.height / 2 + 30, { steps: 8 });
  await visitor.mouse.up();

  // The exploded-view player: it opens on the finished piece; go to the first step, then step on
  // three times (buttons twice, the arrow key once): the picture changes every time.
  await visitor.waitForFunction(() => (window.__slotwiseScene?.stats().profilesDrawn ?? 0) > 0, null, { timeout: 60_000 });
  const player = visitor.getByTestId('step-player');
  const current = player.getByTestId('current-step');
  await expect(current).toContainText(/Step \d+ of \d+/);
  const total = Number((await current.textContent())!.match(/of (\d+)/)![1]);
  expect(total, 'the demo design has at least four steps').toBeGreaterThanOrEqual(4);
  await visitor.getByRole('list', { name: 'Assembly steps' }).getByRole('button').first().click();
  await expect(current).toContainText(`Step 1 of ${total}`);
  // Travel takes under a second; wait for the parts to arrive and the camera to settle.
  await visitor.waitForTimeout(1600);
  let previous = await canvasImage(visitor);
  for (let i = 2; i <= 4; i++) {
    if (i === 3) await visitor.keyboard.press('ArrowRight');
    else await player.getByRole('button', { name: 'Next step' }).click();
    await expect(current).toContainText(`Step ${i} of ${total}`);
    await visitor.waitForTimeout(1600);
    const image = await canvasImage(visitor);
    expect(image, `the canvas differs between step ${i - 1} and step ${i}`).not.toEqual(previous);
    previous = image;
  }
  await visitor.screenshot({ path: testInfo.outputPath('link-step-4.png') });
  // The explode slider pushes the placed parts apart: the picture changes on the same step.
  await visitor.getByLabel('Explode the finished piece').fill('80');
  await visitor.waitForTimeout(800);
  expect(await canvasImage(visitor), 'the explode slider changes the picture').not.toEqual(previous);
  // Section view along X with its slider.
  await visitor.getByRole('button', { name: 'X', exact: true }).click();
  await expect(visitor.getByRole('button', { name: 'X', exact: true })).toHaveAttribute('aria-pressed', 'true');
  await visitor.getByLabel('Section position along X').fill('0.3');
  // Nothing can be saved: no save control, and the server refuses writes through the link.
  await expect(visitor.getByRole('button', { name: /save/i })).toHaveCount(0);
  const write = await visitor.request.post(`/api/shared/${token}`, { headers: { 'X-Slotwise-Client': '1' }, data: { document: {} } });
  expect(write.status()).toBe(403);
  const save = await visitor.request.post('/api/designs/1/revisions', { headers: { 'X-Slotwise-Client': '1' }, data: { baseRevision: 1, document: {} } });
  expect(save.status()).toBe(401);

  await page.reload();
  await expect(page.getByText(/opened [1-9]\d* times?/)).toBeVisible();
  await page.getByRole('button', { name: 'Revoke class' }).click();
  await page.getByRole('alertdialog').getByRole('button', { name: 'Revoke class' }).click();
  await expect(page.getByText(/Revoked/)).toBeVisible();

  await visitor.reload();
  await expect(visitor.getByTestId('link-error')).toContainText('This link does not work', { timeout: 60_000 });
  await visitorContext.close();
});
