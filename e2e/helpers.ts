import { expect, type Page } from '@playwright/test';

export type DemoRole = 'owner' | 'designer' | 'builder' | 'customer' | 'instructor';

/** Password of every seeded demo account (contract: "Demo accounts"). */
export const DEMO_PASSWORD = 'slotwise-demo-2026';

/** The seeded demo shop's people, by role. */
export const DEMO_ACCOUNTS: Record<DemoRole, { email: string; displayName: string; home: string }> = {
  owner: { email: 'owner@harborlane.example', displayName: 'Noor Okafor', home: '/designs' },
  designer: { email: 'designer@harborlane.example', displayName: 'Tomasz Reyes', home: '/designs' },
  builder: { email: 'builder@harborlane.example', displayName: 'Ines Varga', home: '/workbench' },
  customer: { email: 'customer@harborlane.example', displayName: 'Priya Lindqvist', home: '/reviews' },
  instructor: { email: 'instructor@harborlane.example', displayName: 'Malik Osei', home: '/classes' },
};

/** Fills the sign-in form (already on /sign-in or not) and submits it, without waiting for the outcome. */
export async function submitSignIn(page: Page, email: string, password: string): Promise<void> {
  if (!new URL(page.url(), 'http://x').pathname.startsWith('/sign-in')) await page.goto('/sign-in');
  await page.getByLabel('Email').fill(email);
  await page.getByLabel('Password').fill(password);
  await page.getByRole('button', { name: 'Sign in' }).click();
}

/**
 * Signs in as a demo account and waits until its start page shows the main navigation.
 * Pass `next` to start from a deep link, e.g. signIn(page, 'designer', '/designs/1').
 */
export async function signIn(page: Page, role: DemoRole, next?: string): Promise<void> {
  const account = DEMO_ACCOUNTS[role];
  await page.goto(next ? `/sign-in?next=${encodeURIComponent(next)}` : '/sign-in');
  await submitSignIn(page, account.email, DEMO_PASSWORD);
  await page.waitForURL((url) => url.pathname === (next ? new URL(next, 'http://x').pathname : account.home));
  await expect(page.getByRole('navigation', { name: 'Main' })).toBeVisible();
}

/** Signs out through the navigation's button and waits for the sign-in page. */
export async function signOut(page: Page): Promise<void> {
  await page.getByRole('button', { name: 'Sign out' }).click();
  await page.waitForURL((url) => url.pathname === '/sign-in');
  await expect(page.getByRole('heading', { name: 'Sign in' })).toBeVisible();
}
