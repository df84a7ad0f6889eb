import { expect, test } from '@playwright/test';
import { signIn } from './helpers';

test('an instructor shares a class link; an anonymous visitor views it read-only; revoking the class stops it', async ({ page, browser }) => {
  // Three browser contexts and two 3D views on a shared machine: allow more than the default.
  test.setTimeout(240_000);
  await signIn(page, 'instructor');
  await page.getByRole('button', { name: 'New class' }).first().click();
  await page.getByLabel('Name').fill('Frames 101');
  await page.getByLabel('Description').fill('Week 3: enclosures');
  await page.getByRole('button', { name: 'Create class' }).click();
  await expect(page.getByRole('heading', { name: 'Frames 101' })).toBeVisible();
  await page.getByRole('button', { name: 'Add link' }).click();
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
