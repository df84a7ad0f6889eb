import { expect, test, type Locator, type Page } from '@playwright/test';
import { signIn } from './helpers';

const DEMO_DESIGN = 'Two-level printer enclosure';

async function openSequence(page: Page): Promise<Locator> {
  const dock = page.getByRole('region', { name: 'Checks and outputs' });
  await dock.getByRole('tab', { name: 'Sequence' }).click();
  const panel = page.getByTestId('sequence-panel');
  await expect(panel.getByTestId('sequence-step').first()).toBeVisible({ timeout: 30_000 });
  return panel;
}

async function stepTitles(panel: Locator): Promise<string[]> {
  return panel.getByTestId('sequence-step').locator('span.truncate').allInnerTexts();
}

/** Drags one step's handle onto another step with the mouse (dnd-kit pointer sensor). */
async function dragStep(page: Page, panel: Locator, from: number, to: number): Promise<void> {
  const handle = panel.getByRole('button', { name: new RegExp(`^Drag step ${from}:`) });
  const target = panel.getByTestId('sequence-step').nth(to - 1);
  // Both rows in the middle of the scrolling dock, away from the edges where dnd-kit scrolls.
  await panel.getByTestId('sequence-step').nth(from - 1).evaluate((el) => el.scrollIntoView({ block: 'center' }));
  const a = (await handle.boundingBox())!;
  const b = (await target.boundingBox())!;
  await page.mouse.move(a.x + a.width / 2, a.y + a.height / 2);
  await page.mouse.down();
  await page.mouse.move(a.x + a.width / 2, a.y + a.height / 2 + 8, { steps: 3 });
  await page.mouse.move(a.x + a.width / 2, b.y + b.height * 0.6, { steps: 12 });
  await page.mouse.up();
}

test('a designer reorders the demo enclosure sequence, sees the finding for an infeasible order, undoes, saves and reloads', async ({ page }, testInfo) => {
  test.setTimeout(180_000);
  await signIn(page, 'designer');
  await page.getByRole('link', { name: DEMO_DESIGN, exact: true }).click();
  await page.waitForURL(/\/designs\/\d+$/);
  const designUrl = page.url();
  const panel = await openSequence(page);
  const original = await stepTitles(panel);
  expect(original[2]).toBe('Slide in the bottom shelf');
  expect(original[3]).toBe('Bottom rail: front');
  await expect(panel.getByTestId('sequence-finding')).toHaveCount(0);

  // Drag the shelf (step 3) below the front rail that closes its slots (step 4): infeasible.
  await dragStep(page, panel, 3, 4);
  await expect.poll(() => stepTitles(panel)).toEqual([...original.slice(0, 2), original[3], original[2], ...original.slice(4)]);
  const finding = panel.getByTestId('sequence-finding');
  await expect(finding).toHaveCount(1, { timeout: 30_000 });
  await expect(finding).toContainText('slides in at step 4');
  await expect(finding).toContainText('closes its frame in step 3');
  await expect(finding.getByRole('button', { name: 'Move step 4 before step 3' })).toBeVisible();
  await page.screenshot({ path: testInfo.outputPath('01-infeasible-order.png') });

  // Undo puts the order back and the finding goes.
  await page.keyboard.press('Control+z');
  await expect.poll(() => stepTitles(panel)).toEqual(original);
  await expect(panel.getByTestId('sequence-finding')).toHaveCount(0, { timeout: 30_000 });

  // A feasible edit by keyboard: focus the doors' handle, Space, ArrowDown, Space (after the feet).
  const doors = original.indexOf('Hang the doors') + 1;
  const handle = panel.getByRole('button', { name: new RegExp(`^Drag step ${doors}:`) });
  await handle.evaluate((el) => el.scrollIntoView({ block: 'center' }));
  await handle.focus();
  await page.keyboard.press('Space');
  await page.waitForTimeout(300);
  await page.keyboard.press('ArrowDown');
  await page.waitForTimeout(300);
  await page.keyboard.press('Space');
  const edited = [...original.slice(0, doors - 1), original[doors], original[doors - 1], ...original.slice(doors + 1)];
  await expect.poll(() => stepTitles(panel)).toEqual(edited);

  // Save, reload: the order is kept.
  await page.keyboard.press('Control+s');
  await expect(page.getByTestId('save-status')).toContainText(/Saved just now/);
  await page.reload();
  await page.waitForURL(designUrl);
  const reloaded = await openSequence(page);
  await expect.poll(() => stepTitles(reloaded)).toEqual(edited);
  await expect(reloaded).toContainText('edited');
  await page.screenshot({ path: testInfo.outputPath('02-reloaded.png') });
});
