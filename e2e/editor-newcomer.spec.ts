import { expect, test, type Locator, type Page } from '@playwright/test';
import { signIn } from './helpers';

/** A new, empty design, opened in the editor. */
async function newDesign(page: Page, name: string, systemId: string, units: 'Millimetres (mm)' | 'Inches (in)'): Promise<void> {
  await page.goto('/designs');
  await page.getByRole('button', { name: 'New design' }).first().click();
  await page.getByLabel('Name').fill(name);
  await page.getByLabel('Profile system').selectOption(systemId);
  await page.getByRole('radio', { name: units }).check();
  await page.getByRole('button', { name: 'Create and open' }).click();
  await expect(page.getByRole('heading', { level: 1, name })).toBeVisible();
}

/** Frame starters → Table, made with the dialog's defaults. */
async function makeTable(page: Page): Promise<void> {
  await page.getByRole('button', { name: 'Frame starters' }).click();
  const dialog = page.getByRole('dialog', { name: 'Frame starters' });
  await dialog.getByRole('radio', { name: 'Table' }).click();
  const primary = dialog.getByRole('button', { name: 'Replace design' });
  await expect(primary, 'the primary button is on screen without scrolling').toBeInViewport();
  await primary.click();
  await expect(dialog).toBeHidden();
}

const outputs = (page: Page) => page.getByRole('region', { name: 'Checks and outputs' });
const inspector = (page: Page) => page.getByRole('complementary', { name: 'Inspector' });

async function showTab(page: Page, name: string): Promise<Locator> {
  await outputs(page).getByRole('tab', { name }).click();
  return outputs(page).getByRole('tabpanel');
}

test.describe('the editor as a newcomer meets it', () => {
  test.setTimeout(240_000);

  test('a table from the starter resizes from the inspector, the outputs enlarge and follow the selection, and the keyboard alone edits a profile', async ({ page }, testInfo) => {
    await signIn(page, 'designer');
    await newDesign(page, 'Newcomer table', 'metric-40', 'Millimetres (mm)');
    await makeTable(page);

    // 1. Change the width in the inspector: the cuts change, the joints stay complete, undo restores.
    const cuts = await showTab(page, 'Cuts');
    // Front and back rails run between the legs: 1200 mm − 2 × 40 mm.
    await expect(cuts.getByRole('row').filter({ hasText: '1120 mm' }).first()).toBeVisible();
    const group = inspector(page).getByRole('region', { name: /^Frame group: Table/ });
    await group.getByLabel('Width (X)').fill('1400');
    await group.getByRole('button', { name: 'Apply sizes' }).click();
    await expect(cuts.getByRole('row').filter({ hasText: '1320 mm' }).first()).toBeVisible();
    await expect(cuts.getByRole('row').filter({ hasText: '1120 mm' })).toHaveCount(0);
    await expect(outputs(page)).toContainText('0 errors');
    await page.keyboard.press('Control+z');
    await expect(cuts.getByRole('row').filter({ hasText: '1120 mm' }).first()).toBeVisible();
    await expect(cuts.getByRole('row').filter({ hasText: '1320 mm' })).toHaveCount(0);
    await page.keyboard.press('Control+Shift+z');
    await expect(cuts.getByRole('row').filter({ hasText: '1320 mm' }).first()).toBeVisible();

    // 2. Outputs at full width: over the whole editor below the top bar (the inspector too), room for at least ten rows.
    await outputs(page).getByRole('button', { name: 'Full width' }).click();
    await expect(outputs(page).getByRole('button', { name: 'Full width' })).toHaveAttribute('aria-pressed', 'true');
    const body = page.getByTestId('outputs-body');
    const bodyBox = (await body.boundingBox())!;
    // From the tool strip's left edge (beside the app's own navigation) to the window's right edge, over the inspector.
    const toolsBox = (await page.locator('nav[aria-label="Editing tools"]').boundingBox())!;
    expect(Math.abs(bodyBox.x - toolsBox.x), 'the tables start where the tool strip does').toBeLessThanOrEqual(1);
    expect(bodyBox.x + bodyBox.width, 'the tables reach the window edge').toBeGreaterThanOrEqual(page.viewportSize()!.width - 1);
    // What lies under it cannot take focus or be read out meanwhile.
    const inspectorInert = () => page.evaluate(() => Boolean(document.querySelector('aside[aria-label="Inspector"]')?.closest('[inert]')));
    expect(await inspectorInert()).toBe(true);
    // The camera buttons in the top bar are off too: the model they would turn is covered.
    const camera = page.locator('header').getByRole('group', { name: 'Camera' });
    await expect(camera.getByRole('button', { name: 'Show all' })).toBeDisabled();
    await expect(camera.getByRole('button', { name: 'Three-quarter view' })).toBeDisabled();
    const firstRow = cuts.locator('tbody tr').first();
    const rowHeight = (await firstRow.boundingBox())!.height;
    expect(Math.floor(bodyBox.height / rowHeight), 'rows that fit in the enlarged area').toBeGreaterThanOrEqual(10);
    const parts = await showTab(page, 'Parts');
    const rows = parts.locator('tbody tr');
    const total = await rows.count();
    let visible = 0;
    for (let i = 0; i < total; i++) {
      const box = await rows.nth(i).boundingBox();
      if (box && box.y >= bodyBox.y && box.y + box.height <= bodyBox.y + bodyBox.height + 1) visible++;
    }
    expect(visible, `visible rows of ${total}`).toBeGreaterThanOrEqual(Math.min(10, total));
    await page.screenshot({ path: testInfo.outputPath('editor-outputs-full-width-1440x900.png') });
    // Escape leaves full width and gives the focus back to its toggle; the model and inspector return.
    await page.keyboard.press('Escape');
    await expect(outputs(page).getByRole('button', { name: 'Full width' })).toHaveAttribute('aria-pressed', 'false');
    await expect(outputs(page).getByRole('button', { name: 'Full width' })).toBeFocused();
    expect(await inspectorInert()).toBe(false);
    await expect(camera.getByRole('button', { name: 'Show all' })).toBeEnabled();

    // 3. Click a cut row: its profiles are selected, in the parts list and the inspector.
    await showTab(page, 'Cuts');
    const railRow = cuts.locator('tbody tr[aria-selected]').filter({ hasText: '1320 mm' }).first();
    await railRow.click();
    await expect(railRow).toHaveAttribute('aria-selected', 'true');
    // The 1320 mm group holds the four long rails (top and lower, front and back).
    await expect(inspector(page)).toContainText('4 selected');
    await expect(page.getByRole('listbox', { name: 'Parts' }).getByRole('option', { selected: true })).toHaveCount(4);

    // 6. Keyboard only: find one upright in the parts list, select it, change its length.
    await page.keyboard.press('Escape');
    const search = page.getByRole('searchbox', { name: 'Find a part' });
    for (let i = 0; i < 80 && !(await search.evaluate((el) => el === document.activeElement)); i++) await page.keyboard.press('Tab');
    await expect(search).toBeFocused();
    await page.keyboard.type('Upright, back left');
    await page.keyboard.press('ArrowDown');
    await page.keyboard.press('Enter');
    await expect(inspector(page).getByRole('region', { name: 'Profile Upright, back left' })).toBeVisible();
    const length = inspector(page).getByRole('textbox', { name: 'Length', exact: true });
    for (let i = 0; i < 40 && !(await length.evaluate((el) => el === document.activeElement)); i++) await page.keyboard.press('Tab');
    await expect(length).toBeFocused();
    await page.keyboard.press('Control+a');
    await page.keyboard.type('850');
    await page.keyboard.press('Enter');
    await expect(inspector(page).getByRole('textbox', { name: 'Length', exact: true })).toHaveValue(/850/);
    await expect(cuts.getByRole('row').filter({ hasText: '850 mm' }).first()).toBeVisible();

    // Screenshots at the three sizes people use, kept with the test output.
    for (const [width, height] of [[1440, 900], [1280, 800], [1024, 768]] as const) {
      await page.setViewportSize({ width, height });
      if (width === 1024) {
        // Full width on the small screen (before the reload below drops the unsaved table): every Parts
        // column within the window, reached and left by keyboard.
        const fullWidth = outputs(page).getByRole('button', { name: 'Full width' });
        await fullWidth.focus();
        await page.keyboard.press('Enter');
        await showTab(page, 'Parts');
        const tableBox = (await outputs(page).getByRole('table').first().boundingBox())!;
        expect(tableBox.x + tableBox.width, 'the parts table fits the window').toBeLessThanOrEqual(1024 + 1);
        await page.screenshot({ path: testInfo.outputPath('editor-outputs-full-width-1024x768.png') });
        await page.keyboard.press('Escape');
        await expect(fullWidth).toHaveAttribute('aria-pressed', 'false');
        // A narrow window starts folded: reload so the layout starts as it would.
        await page.reload();
        await expect(page.getByRole('heading', { level: 1, name: 'Newcomer table' })).toBeVisible();
        const tabs = outputs(page).getByRole('tab');
        const tops = new Set<number>();
        for (let i = 0; i < (await tabs.count()); i++) tops.add(Math.round((await tabs.nth(i).boundingBox())!.y));
        expect(tops.size, 'the outputs tabs sit on one row').toBe(1);
        const title = (await page.getByRole('heading', { level: 1, name: 'Newcomer table' }).boundingBox())!;
        expect(title.width, 'the design name is readable').toBeGreaterThan(100);
      }
      await page.waitForTimeout(500);
      await page.screenshot({ path: testInfo.outputPath(`editor-${width}x${height}.png`) });
    }
  });

  test('an inch design shows its inputs and outputs in inches', async ({ page }) => {
    await signIn(page, 'designer');
    await newDesign(page, 'Newcomer inch bench', 'inch-1.5', 'Inches (in)');
    await page.getByRole('button', { name: 'Frame starters' }).click();
    const dialog = page.getByRole('dialog', { name: 'Frame starters' });
    await dialog.getByRole('radio', { name: 'Table' }).click();
    // Inch starters start from whole inch sizes (1200 mm → 48 in), typed and read in inches.
    await expect(dialog.getByLabel('Width (X)')).toHaveValue('48 in');
    await expect(dialog.getByLabel('Depth (Z)')).toHaveValue('30 in');
    await dialog.getByRole('button', { name: 'Replace design' }).click();
    await expect(page.getByRole('radio', { name: 'in', exact: true })).toHaveAttribute('aria-checked', 'true');
    const cuts = await showTab(page, 'Cuts');
    const firstCut = cuts.locator('tbody tr[aria-selected]').first();
    await expect(firstCut).toContainText(' in');
    await expect(firstCut).not.toContainText(' mm');
    await expect(inspector(page).getByRole('region', { name: /^Frame group: Table/ }).getByLabel('Width (X)')).toHaveValue('48 in');
  });
});
