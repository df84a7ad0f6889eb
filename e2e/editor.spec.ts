import { expect, test, type Page } from '@playwright/test';
import { signIn } from './helpers';

type Vec3 = [number, number, number];

/** Where a world point (mm) shows on the page, from the scene's test hook. */
async function screenPoint(page: Page, point: Vec3): Promise<{ x: number; y: number }> {
  return page.evaluate((p) => {
    const hook = (window as unknown as { __slotwiseScene?: { worldToScreen(p: Vec3): { x: number; y: number } } }).__slotwiseScene;
    if (!hook) throw new Error('The 3D view has no test hook');
    return hook.worldToScreen(p);
  }, point);
}

async function clickWorld(page: Page, point: Vec3): Promise<void> {
  const { x, y } = await screenPoint(page, point);
  await page.mouse.move(x, y, { steps: 4 });
  await page.mouse.click(x, y);
}

/** Draws one profile with the draw tool: a click on the start point, a click on the end point. */
async function drawProfile(page: Page, from: Vec3, to: Vec3): Promise<void> {
  await clickWorld(page, from);
  await clickWorld(page, to);
  // Drawing chains profiles end to end; Escape ends the chain and keeps the draw tool.
  await page.keyboard.press('Escape');
}


test('a designer draws a rectangle, joins it, fills it, checks the outputs, undoes, saves and reloads', async ({ page }, testInfo) => {
  // The whole design journey in one test, rendered through SwiftShader on a shared 2-core machine.
  test.setTimeout(180_000);
  await signIn(page, 'designer');

  // A new, empty design.
  await page.getByRole('button', { name: 'New design' }).first().click();
  await page.getByLabel('Name').fill('Base frame e2e');
  await page.getByLabel('Profile system').selectOption('metric-40');
  await page.getByRole('radio', { name: 'Millimetres (mm)' }).check();
  await page.getByRole('button', { name: 'Create and open' }).click();
  await page.waitForURL(/\/designs\/\d+$/);
  const designUrl = page.url();
  await expect(page.getByRole('heading', { level: 1, name: 'Base frame e2e' })).toBeVisible();
  await page.waitForFunction(() => Boolean((window as unknown as { __slotwiseScene?: unknown }).__slotwiseScene));
  await page.screenshot({ path: testInfo.outputPath('01-empty-design.png') });

  // Look straight down with the outputs folded away, so the whole floor plan is in view.
  const dock = page.getByRole('region', { name: 'Checks and outputs' });
  await dock.getByRole('button', { name: /Checks and outputs/ }).click();
  await page.keyboard.press('2');
  await page.waitForTimeout(800);

  // Four profiles on the floor: two 1000 mm rails along X, two 560 mm cross members between their faces.
  await page.keyboard.press('d');
  const drawSettings = page.getByRole('region', { name: 'Draw settings' });
  await expect(drawSettings).toBeVisible();
  const canvasBox = (await page.getByTestId('editor-canvas').boundingBox())!;
  const cardBox = (await drawSettings.boundingBox())!;
  // Front is -Z, so the top view shows the front edge at the bottom and +X to the left.
  for (const corner of [[300, 0, -300], [-700, 0, 300]] as Vec3[]) {
    const point = await screenPoint(page, corner);
    expect(point.x, 'the frame is drawn clear of the draw settings card').toBeGreaterThan(cardBox.x + cardBox.width);
    expect(point.x).toBeLessThan(canvasBox.x + canvasBox.width);
    expect(point.y).toBeGreaterThan(canvasBox.y);
    expect(point.y).toBeLessThan(canvasBox.y + canvasBox.height);
  }
  // The rails are picked on the floor (y = 0) and then rest on it; the cross members snap to the
  // rails' faces, whose axes lie 20 mm up (half the 40 mm section), so those clicks aim at that
  // height and no perspective shift creeps in.
  await drawProfile(page, [-700, 0, -300], [300, 0, -300]);
  await drawProfile(page, [-700, 0, 300], [300, 0, 300]);
  // A cross member starts on the first rail's face (20 mm, half the 40 mm section, from its axis) and snaps to the other rail's face.
  await drawProfile(page, [100, 20, -280], [100, 20, 280]);
  await drawProfile(page, [-500, 20, -280], [-500, 20, 280]);
  await page.keyboard.press('Escape');
  await expect(page.getByRole('button', { name: 'Pick' })).toHaveAttribute('aria-pressed', 'true');

  const inspector = page.getByRole('complementary', { name: 'Inspector' });
  const designSummary = inspector.getByRole('region', { name: 'Design' });
  await expect(designSummary).toContainText('Profiles4');
  await page.screenshot({ path: testInfo.outputPath('02-four-profiles.png') });

  // The four tees are proposed; accept them all with the suggested connector.
  const meetings = inspector.getByTestId('joint-proposal');
  await expect(meetings).toHaveCount(4);
  await inspector.getByRole('button', { name: 'Accept all' }).click();
  await expect(meetings).toHaveCount(0);
  await expect(designSummary).toContainText('Joints4');

  // Fill the opening with a panel.
  await page.getByRole('button', { name: 'Fill' }).click();
  const openings = inspector.getByRole('list', { name: 'Openings' }).getByRole('button');
  await expect(openings).toHaveCount(1);
  // Clear size between the inner faces: 500 − (−100) − 40 = 560 mm across, 280 − (−280) = 560 mm deep.
  await expect(openings.first()).toContainText('560 mm × 560 mm');
  await openings.first().click();
  await inspector.getByRole('button', { name: 'Fill opening' }).click();
  await expect(inspector.getByRole('region', { name: /^Panel / })).toBeVisible();
  await page.screenshot({ path: testInfo.outputPath('03-filled.png') });

  // Bill of materials: four pieces, 3.12 m of profile in all (2 × 1000 + 2 × 560 mm); four connectors.
  await dock.getByRole('button', { name: /Checks and outputs/ }).click();
  await dock.getByRole('tab', { name: 'Parts' }).click();
  const profileLine = dock.getByRole('row').filter({ hasText: 'EXT-40X40' });
  await expect(profileLine).toContainText('4 pieces');
  await expect(profileLine).toContainText('3.120 m');
  await expect(dock.getByRole('row').filter({ hasText: /corner bracket/i }).first()).toContainText('4 pcs');

  // Cut list: two 1000 mm rails and two 560 mm cross members.
  await dock.getByRole('tab', { name: 'Cuts' }).click();
  await expect(dock.getByRole('row').filter({ hasText: '1000 mm' }).first()).toContainText('2 pcs');
  await expect(dock.getByRole('row').filter({ hasText: '560 mm' }).first()).toContainText('2 pcs');
  await page.screenshot({ path: testInfo.outputPath('04-outputs.png') });

  // Undo removes the panel; redo puts it back.
  await page.getByRole('button', { name: /^Undo Fill opening/ }).click();
  await expect(designSummary).toContainText('Panels0');
  await page.keyboard.press('Control+Shift+Z');
  await expect(designSummary).toContainText('Panels1');

  // Save, then reload and find the same design.
  await expect(page.getByTestId('save-status')).toContainText('Unsaved changes');
  await page.keyboard.press('Control+s');
  await expect(page.getByTestId('save-status')).toContainText(/Saved just now by Tomasz · rev 2/);
  await page.screenshot({ path: testInfo.outputPath('05-saved.png') });

  await page.reload();
  await page.waitForURL(designUrl);
  const designRegion = page.getByRole('complementary', { name: 'Inspector' }).getByRole('region', { name: 'Design' });
  await expect(designRegion).toContainText('Profiles4');
  await expect(designRegion).toContainText('Joints4');
  await expect(designRegion).toContainText('Panels1');
  await expect(page.getByTestId('save-status')).toContainText('rev 2');
  await page.screenshot({ path: testInfo.outputPath('06-reloaded.png') });
});

test('the sign-in page, the designs list and the editor log no console errors or warnings, and every demo design shows a picture', async ({ page }, testInfo) => {
  test.setTimeout(120_000);
  const messages: string[] = [];
  page.on('console', (message) => {
    if (message.type() !== 'error' && message.type() !== 'warning') return;
    // The test browser draws WebGL in software (SwiftShader); Chromium's own notes about that are not ours.
    if (/swiftshader|software WebGL|GPU stall|GL Driver Message|WebGL-/i.test(message.text())) return;
    messages.push(`${message.type()} on ${new URL(page.url()).pathname}: ${message.text()}`);
  });
  page.on('pageerror', (error) => messages.push(`page error on ${new URL(page.url()).pathname}: ${error.message}`));

  // Anonymous: asking who is signed in is answered, not refused.
  const me = page.waitForResponse((response) => response.url().endsWith('/api/auth/me'));
  await page.goto('/sign-in');
  expect((await me).status()).toBe(200);
  await expect(page.getByRole('button', { name: 'Sign in' })).toBeVisible();

  await signIn(page, 'designer');
  // Every seeded design has its picture before anyone opens it (drawn by the server at seed time).
  for (const name of ['Two-level printer enclosure', 'Standing workbench', 'Plant rack']) {
    const picture = page.getByRole('img', { name: `Picture of ${name}` });
    await expect(picture).toBeVisible();
    await expect.poll(() => picture.evaluate((img: HTMLImageElement) => img.complete && img.naturalWidth)).toBe(320);
  }
  await page.screenshot({ path: testInfo.outputPath('designs-list-1440x900.png'), fullPage: true });
  await page.setViewportSize({ width: 390, height: 844 });
  await page.screenshot({ path: testInfo.outputPath('designs-list-390x844.png'), fullPage: true });
  await page.setViewportSize({ width: 1440, height: 900 });

  await page.getByRole('link', { name: 'Plant rack', exact: true }).click();
  await page.waitForURL(/\/designs\/\d+$/);
  await page.waitForFunction(() => Boolean((window as unknown as { __slotwiseScene?: unknown }).__slotwiseScene));
  await expect(page.getByRole('heading', { level: 1, name: 'Plant rack' })).toBeVisible();
  // Let the analysis and a few frames run.
  await page.waitForTimeout(1500);
  expect(messages).toEqual([]);
});
