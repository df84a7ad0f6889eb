import { gzipSync } from 'node:zlib';
import { expect, test, type Page } from '@playwright/test';
import { DEMO_ACCOUNTS, DEMO_PASSWORD, signIn, signOut, submitSignIn } from './helpers';

const mainNav = (page: Page) => page.getByRole('navigation', { name: 'Main' });

test.describe('signing in and what each role sees', () => {
  test('the designer sees the designs list, no People entry, and is refused at /people', async ({ page }, testInfo) => {
    await signIn(page, 'designer');

    await expect(page.getByRole('heading', { level: 1, name: 'Designs' })).toBeVisible();
    await expect(mainNav(page).getByRole('link')).toHaveText(['Designs', 'Account']);
    await expect(page.getByText(DEMO_ACCOUNTS.designer.displayName)).toBeVisible();
    // The three seeded designs (contract: "Seeded designs").
    const designs = page.getByRole('list', { name: 'Designs' });
    for (const name of ['Two-level printer enclosure', 'Standing workbench', 'Plant rack']) {
      await expect(designs.getByRole('link', { name, exact: true })).toBeVisible();
    }
    await expect(designs.getByText(/Updated .+ by Tomasz/).first()).toBeVisible();
    await page.screenshot({ path: testInfo.outputPath('designs-list.png') });

    await page.goto('/people');
    await expect(page.getByRole('heading', { name: 'This page is not available for your role' })).toBeVisible();
    await expect(page.getByRole('table')).toHaveCount(0);
  });

  test('the owner sees People with the five demo accounts', async ({ page }) => {
    await signIn(page, 'owner');
    await expect(mainNav(page).getByRole('link')).toHaveText(['Designs', 'People', 'Outbox', 'Account']);

    await mainNav(page).getByRole('link', { name: 'People' }).click();
    const table = page.getByRole('table');
    await expect(table).toBeVisible();
    for (const account of Object.values(DEMO_ACCOUNTS)) {
      await expect(table.getByText(account.email)).toBeVisible();
    }
    await expect(table.getByRole('row')).toHaveCount(1 + 5);
    // The owner cannot change their own role from here.
    await expect(page.getByLabel(`Role of ${DEMO_ACCOUNTS.owner.displayName}`)).toBeDisabled();
  });

  test('the builder lands on an honest empty workbench', async ({ page }) => {
    await signIn(page, 'builder');
    await expect(mainNav(page).getByRole('link')).toHaveText(['Workbench', 'Account']);
    await expect(page.getByRole('heading', { name: 'No builds assigned to you yet' })).toBeVisible();
  });

  test('a wrong password shows the generic message and stays on sign-in', async ({ page }) => {
    await page.goto('/sign-in');
    await submitSignIn(page, DEMO_ACCOUNTS.designer.email, 'not-the-password');
    await expect(page.getByRole('alert')).toContainText('That email and password do not match an active account.');
    await expect(page).toHaveURL(/\/sign-in$/);

    // An unknown email gets exactly the same words, so the form does not reveal who has an account.
    await submitSignIn(page, 'nobody@harborlane.example', DEMO_PASSWORD);
    await expect(page.getByRole('alert')).toContainText('That email and password do not match an active account.');
  });

  test('signing out returns to sign-in and pages ask to sign in again', async ({ page }) => {
    await signIn(page, 'designer');
    await signOut(page);

    await page.goto('/account');
    await expect(page).toHaveURL(/\/sign-in\?next=%2Faccount$/);
    await submitSignIn(page, DEMO_ACCOUNTS.designer.email, DEMO_PASSWORD);
    await expect(page).toHaveURL(/\/account$/);
    await expect(page.getByRole('heading', { level: 1, name: 'Account' })).toBeVisible();
  });
});

test('the sign-in and designs pages load under 200 KB of gzipped JavaScript, without the 3D editor', async ({ page }) => {
  // Budget from the quality brief ("sign-in and list pages load under 200 KB gzip of JS").
  const scripts = new Map<string, number>();
  page.on('response', async (response) => {
    const url = new URL(response.url());
    if (!url.pathname.endsWith('.js') || response.status() !== 200) return;
    scripts.set(url.pathname, gzipSync(await response.body(), { level: 9 }).length);
  });
  const totalKb = () => [...scripts.values()].reduce((sum, size) => sum + size, 0) / 1024;

  await page.goto('/sign-in');
  await expect(page.getByRole('button', { name: 'Sign in' })).toBeVisible();
  await page.waitForLoadState('networkidle');
  const signInKb = totalKb();
  expect(signInKb, `sign-in page JavaScript: ${signInKb.toFixed(1)} KB gzip`).toBeLessThan(200);

  await submitSignIn(page, DEMO_ACCOUNTS.designer.email, DEMO_PASSWORD);
  await expect(page.getByRole('list', { name: 'Designs' })).toBeVisible();
  await page.waitForLoadState('networkidle');
  const listKb = totalKb();
  console.log(`JavaScript loaded (gzip): sign-in ${signInKb.toFixed(1)} KB, sign-in + designs list ${listKb.toFixed(1)} KB`);
  expect(listKb, `designs list JavaScript: ${listKb.toFixed(1)} KB gzip`).toBeLessThan(200);
  expect([...scripts.keys()].filter((path) => /EditorRoute|three/i.test(path))).toEqual([]);
});
