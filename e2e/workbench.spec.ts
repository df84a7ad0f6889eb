import { expect, test, type Browser, type Page } from '@playwright/test';
import { signIn } from './helpers';

const CLIENT = { 'X-Slotwise-Client': '1' };

async function newSignedInPage(browser: Browser, role: 'designer' | 'builder', viewport = { width: 1024, height: 768 }): Promise<Page> {
  const context = await browser.newContext({ viewport, hasTouch: role === 'builder' });
  const page = await context.newPage();
  await signIn(page, role);
  return page;
}

test.describe.serial('the builder’s workbench', () => {
  let buildId = 0;

  test('a designer assigns the demo enclosure; the builder cuts, steps through, ticks, reloads and resumes; the designer sees progress', async ({ browser }, testInfo) => {
    const designer = await newSignedInPage(browser, 'designer', { width: 1280, height: 900 });
    const card = designer.getByRole('listitem').filter({ has: designer.getByRole('heading', { name: 'Two-level printer enclosure' }) });
    await card.getByRole('button', { name: 'Assign build' }).click();
    const dialog = designer.getByRole('dialog');
    await dialog.getByLabel('Ines Varga').check();
    await dialog.getByLabel('Due date').fill('2026-12-18');
    await dialog.getByLabel('Note for the builders').fill('Acrylic panels are in the back room');
    const [created] = await Promise.all([
      designer.waitForResponse((response) => response.url().endsWith('/api/builds') && response.request().method() === 'POST'),
      dialog.getByRole('button', { name: 'Assign build' }).click(),
    ]);
    expect(created.status()).toBe(201);
    buildId = (await created.json()).build.id;
    await expect(dialog).toBeHidden();
    const progressLine = card.getByTestId('design-build-progress').filter({ hasText: `Build ${buildId} ·` });
    await expect(progressLine).toContainText('Planned');

    // The builder, on a tablet in landscape.
    const builder = await newSignedInPage(browser, 'builder');
    await builder.getByTestId('build-card').filter({ hasText: `Build ${buildId} ·` }).click();
    await builder.waitForURL(`**/workbench/builds/${buildId}`);
    await expect(builder.getByRole('heading', { name: 'Two-level printer enclosure' })).toBeVisible();

    // Cut: two pieces ticked, stored on the server.
    for (const piece of ['p-1', 'p-2']) {
      const tick = builder.getByRole('checkbox', { name: `${piece} cut` });
      const box = await tick.boundingBox();
      expect(box!.width).toBeGreaterThanOrEqual(44);
      expect(box!.height).toBeGreaterThanOrEqual(44);
      await tick.click();
      await expect(tick).toHaveAttribute('aria-checked', 'true');
    }
    await expect.poll(async () => (await (await builder.request.get(`/api/builds/${buildId}`)).json()).build.progress.cut).toBe(2);

    // Build: step forward three times; the picture changes each time.
    await builder.getByRole('button', { name: /^Build/ }).click();
    await expect(builder.getByTestId('step-position')).toContainText('Step 1 of 15');
    const canvas = builder.getByTestId('step-canvas');
    const pictures = [await canvas.screenshot()];
    await builder.getByRole('checkbox', { name: 'Step 1 done' }).click();
    await expect(builder.getByText('Done by Ines Varga')).toBeVisible();
    let thirdTitle = '';
    for (let move = 1; move <= 3; move += 1) {
      await builder.getByRole('button', { name: 'Next step' }).click();
      await expect(builder.getByTestId('step-position')).toContainText(`Step ${move + 1} of 15`);
      if (move === 2) thirdTitle = (await builder.getByTestId('step-title').textContent()) ?? '';
      pictures.push(await canvas.screenshot());
      expect(pictures[move].equals(pictures[move - 1]), `step ${move + 1} looks like step ${move}`).toBe(false);
      if (move === 1) {
        await builder.getByRole('checkbox', { name: 'Step 2 done' }).click();
        await expect(builder.getByText('Done by Ines Varga')).toBeVisible();
      }
    }

    await builder.screenshot({ path: testInfo.outputPath('build-tab-step-4.png') });

    // Reload: the page opens at the first step not yet done.
    await builder.reload();
    await expect(builder.getByTestId('step-position')).toContainText('Step 3 of 15');
    expect(thirdTitle).not.toBe('');
    await expect(builder.getByTestId('step-title')).toHaveText(thirdTitle);

    // Dragging the picture turns the view and keeps the step.
    const picture = await builder.getByTestId('step-picture').boundingBox();
    await builder.mouse.move(picture!.x + picture!.width * 0.3, picture!.y + picture!.height / 2);
    await builder.mouse.down();
    await builder.mouse.move(picture!.x + picture!.width * 0.8, picture!.y + picture!.height / 2, { steps: 5 });
    await builder.mouse.up();
    await expect(builder.getByTestId('step-position')).toContainText('Step 3 of 15');

    // Swipe back across the step's details.
    const area = await builder.getByTestId('step-swipe-area').boundingBox();
    await builder.mouse.move(area!.x + area!.width * 0.3, area!.y + area!.height / 2);
    await builder.mouse.down();
    await builder.mouse.move(area!.x + area!.width * 0.8, area!.y + area!.height / 2, { steps: 5 });
    await builder.mouse.up();
    await expect(builder.getByTestId('step-position')).toContainText('Step 2 of 15');

    // Portrait tablet: the tick and the buttons stay at least 44 px.
    await builder.setViewportSize({ width: 768, height: 1024 });
    const next = await builder.getByRole('button', { name: 'Next step' }).boundingBox();
    expect(next!.height).toBeGreaterThanOrEqual(44);

    // The designer sees the progress.
    await designer.reload();
    await expect(progressLine).toContainText('Assembling · 2 pieces cut · 2 steps done');
    await designer.context().close();
    await builder.context().close();
  });

  test('the print view prints to PDF with a cover and one block per step, each with a picture', async ({ browser }, testInfo) => {
    expect(buildId).toBeGreaterThan(0);
    const builder = await newSignedInPage(browser, 'builder');
    await builder.goto(`/workbench/builds/${buildId}/print`);
    await expect(builder.getByTestId('print-cover')).toContainText('Bill of materials');
    await expect(builder.getByTestId('print-cover')).toContainText('Two people to lift');
    const blocks = builder.getByTestId('print-step');
    await expect(blocks).toHaveCount(15);
    // Each picture is rendered from the shared 3D viewer with the exploded-view player, one after another.
    await expect(builder.getByTestId('step-pictures-status')).toHaveText('15 step pictures ready', { timeout: 120_000 });
    await expect(builder.getByTestId('step-picture-renderer')).toHaveCount(0);
    await builder.screenshot({ path: testInfo.outputPath('print-view.png'), fullPage: false });
    const pictureSources = await blocks.locator('img').evaluateAll((images) => images.map((image) => (image as HTMLImageElement).src));
    // Fifteen different pictures: each step shows a different state of the piece.
    expect(new Set(pictureSources).size).toBe(15);
    const pictureWidths = await blocks.locator('img').evaluateAll((images) => images.map((image) => (image as HTMLImageElement).naturalWidth));
    expect(pictureWidths).toHaveLength(15);
    expect(pictureWidths.every((width) => width > 0)).toBe(true);
    await builder.emulateMedia({ media: 'print' });
    await expect(builder.getByRole('button', { name: 'Print' })).toBeHidden();
    const pdfPath = testInfo.outputPath('build-instructions.pdf');
    const pdf = await builder.pdf({ path: pdfPath, format: 'A4', printBackground: true });
    await testInfo.attach('build-instructions.pdf', { path: pdfPath, contentType: 'application/pdf' });
    const pages = (pdf.toString('latin1').match(/\/Type\s*\/Page[^s]/g) ?? []).length;
    // Cover (one or two pages) and 15 steps at two or three to a page.
    expect(pages).toBeGreaterThanOrEqual(5);
    expect(pages).toBeLessThanOrEqual(16);

    // Labels: one per cut piece, each with a QR picture.
    await builder.emulateMedia({ media: 'screen' });
    await builder.goto(`/workbench/builds/${buildId}/labels`);
    await expect(builder.getByTestId('piece-label')).toHaveCount(16);
    await expect(builder.getByTestId('piece-label').first().locator('img')).toBeVisible();
    await builder.context().close();
  });

  test('a builder not assigned to a build is refused it', async ({ browser }) => {
    const designer = await newSignedInPage(browser, 'designer');
    const builders = (await (await designer.request.get('/api/builds/builders')).json()).builders as { id: number }[];
    expect(builders.length).toBeGreaterThan(0);
    const owner = await browser.newContext();
    const ownerPage = await owner.newPage();
    await signIn(ownerPage, 'owner');
    const made = await ownerPage.request.post('/api/users', { headers: CLIENT, data: { email: 'other.builder@harborlane.example', displayName: 'Other Builder', role: 'builder', password: 'other-builder-pw' } });
    expect(made.status()).toBe(201);
    const other = await browser.newContext();
    const otherPage = await other.newPage();
    await otherPage.request.post('/api/auth/sign-in', { headers: CLIENT, data: { email: 'other.builder@harborlane.example', password: 'other-builder-pw' } });
    expect((await otherPage.request.get(`/api/builds/${buildId}`)).status()).toBe(403);
    await designer.context().close();
    await owner.close();
    await other.close();
  });
});
